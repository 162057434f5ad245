import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, useNavigation } from "react-router";
import type { Route } from "./+types/team-api-keys";
import { SubmitButton, TextField } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { apiKeyActionSchema } from "~/lib/api-key-forms";
import { createApiKey, listApiKeys, revokeApiKey } from "~/server/api-keys.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamOwner } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "API keys · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamOwner(request);
  return { keys: await listApiKeys(team.teamId), teamName: team.teamName };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamOwner(request);
  const submission = parseWithZod(await request.formData(), { schema: apiKeyActionSchema });
  if (submission.status !== "success") return data({ result: submission.reply(), created: null }, { status: 400 });
  if (submission.value.intent === "revoke") {
    if (!(await revokeApiKey(team.teamId, submission.value.keyId))) throw new Response("No such live key in your team.", { status: 404 });
    return redirectWithFlash("/team/api-keys", { kind: "info", message: "The key is revoked: requests with it are now refused." });
  }
  // The key itself is returned once, in this response only; it is never stored or shown again.
  const created = await createApiKey(team.teamId, submission.value.name, user.id);
  return data({ result: submission.reply({ resetForm: true }), created });
}

function when(value: unknown) {
  return value ? new Date(value as string).toISOString().slice(0, 16).replace("T", " ") + " UTC" : "never";
}

export default function TeamApiKeys({ loaderData, actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(apiKeyActionSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: apiKeyActionSchema }),
  });
  return (
    <>
      <PageHeader
        title="API keys"
        lead={`Integrators call Kitwright's JSON API as ${loaderData.teamName} with "Authorization: Bearer <key>". Anyone holding a key acts as your team: keep it secret, revoke it when in doubt.`}
      />
      {actionData?.created ? (
        <div role="status" className="mb-6 rounded-lg border border-pass bg-pass-wash p-4">
          <p className="font-medium text-pass">✓ Key "{actionData.created.name}" created. Copy it now: it will not be shown again.</p>
          <code data-testid="new-api-key" className="mt-2 block break-all rounded bg-sheet p-2 text-sm">
            {actionData.created.key}
          </code>
        </div>
      ) : null}
      <div className="grid gap-6 md:grid-cols-[2fr_1fr]">
        <Panel title="Keys">
          {loaderData.keys.length === 0 ? <p className="text-sm text-ink-faint">No keys yet.</p> : null}
          <ul className="divide-y divide-rule">
            {loaderData.keys.map((k) => (
              <li key={k.id} className="flex flex-wrap items-center justify-between gap-2 py-3 text-sm">
                <span>
                  <span className="font-medium">{k.name}</span> <code className="text-ink-faint">{k.prefix}…</code>
                  <span className="block text-xs text-ink-faint">
                    created {when(k.created_at)} · last used {when(k.last_used_at)}
                  </span>
                </span>
                {k.revoked_at ? (
                  <span className="text-xs text-ink-faint">⊘ revoked {when(k.revoked_at)}</span>
                ) : (
                  <Form method="post">
                    <input type="hidden" name="intent" value="revoke" />
                    <input type="hidden" name="keyId" value={k.id} />
                    <button type="submit" className="text-sm text-fail underline">
                      Revoke
                    </button>
                  </Form>
                )}
              </li>
            ))}
          </ul>
        </Panel>
        <Panel title="New key">
          <Form method="post" {...getFormProps(form)} className="space-y-3">
            <input type="hidden" name="intent" value="create" />
            <TextField field={fields.name} label="What will use it?" hint="For example: warehouse stock sync" />
            <SubmitButton pending={navigation.state === "submitting"}>Create key</SubmitButton>
          </Form>
        </Panel>
      </div>
    </>
  );
}
