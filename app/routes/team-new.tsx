import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, redirect, useNavigation } from "react-router";
import type { Route } from "./+types/team-new";
import { SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { teamNameSchema } from "~/lib/auth-forms";
import { auth } from "~/server/auth.server";
import { redirectWithFlash } from "~/server/flash.server";
import { findMembership, requireRole } from "~/server/guards.server";
import { slugForTeam } from "~/server/teams.server";

export const meta: Route.MetaFunction = () => [{ title: "Name your team · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireRole(request, "installer");
  if (await findMembership(user.id)) throw redirect("/team");
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireRole(request, "installer");
  if (await findMembership(user.id)) throw redirect("/team");
  const submission = parseWithZod(await request.formData(), { schema: teamNameSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const name = submission.value.name;
  await auth.api.createOrganization({ body: { name, slug: slugForTeam(name) }, headers: request.headers });
  return redirectWithFlash("/team", { kind: "success", message: `Team "${name}" is ready. Invite your colleagues below.` });
}

export default function TeamNew({ actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(teamNameSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: teamNameSchema }),
  });
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Name your team">
        <p className="mb-4 text-sm text-ink-soft">
          Your team's sites, kit plans, offers and quotes are shared with its members and hidden from everyone else. Customers see your team's name on their
          quotes.
        </p>
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <TextField field={fields.name} label="Team name" autoComplete="organization" />
          <SubmitButton pending={navigation.state === "submitting"}>Create the team</SubmitButton>
        </Form>
      </Panel>
    </div>
  );
}
