import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/team";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { inviteSchema } from "~/lib/auth-forms";
import { teamActionSchema } from "~/lib/team-forms";
import { auth } from "~/server/auth.server";
import { authErrorMessage } from "~/server/auth-errors.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember, requireTeamOwner } from "~/server/guards.server";
import { listMembers, listPendingInvitations } from "~/server/teams.server";

export const meta: Route.MetaFunction = () => [{ title: "Team · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { user, team } = await requireTeamMember(request);
  const [members, invitations] = await Promise.all([listMembers(team.teamId), listPendingInvitations(team.teamId)]);
  return { team, members, invitations, isOwner: team.membershipRole === "owner", userId: user.id };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamOwner(request);
  const submission = parseWithZod(await request.formData(), { schema: teamActionSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const body = submission.value;
  try {
    if (body.intent === "invite") {
      await auth.api.createInvitation({ body: { email: body.email, role: "member", organizationId: team.teamId }, headers: request.headers });
      return redirectWithFlash("/team", { kind: "success", message: `Invitation sent to ${body.email}.` });
    }
    if (body.intent === "cancel-invitation") {
      await auth.api.cancelInvitation({ body: { invitationId: body.invitationId }, headers: request.headers });
      return redirectWithFlash("/team", { kind: "info", message: "The invitation is withdrawn." });
    }
    const members = await listMembers(team.teamId);
    const target = members.find((m) => m.memberId === body.memberId);
    if (!target) throw new Response("No such member in your team.", { status: 404 });
    if (target.userId === user.id)
      return data({ result: submission.reply({ formErrors: ["You own this team and cannot remove yourself."] }) }, { status: 400 });
    await auth.api.removeMember({ body: { memberIdOrEmail: body.memberId, organizationId: team.teamId }, headers: request.headers });
    return redirectWithFlash("/team", { kind: "info", message: `${target.name} is no longer in the team.` });
  } catch (error) {
    const message = authErrorMessage(error);
    if (!message) throw error;
    const field = body.intent === "invite" ? { fieldErrors: { email: [message] } } : { formErrors: [message] };
    return data({ result: submission.reply(field) }, { status: 400 });
  }
}

export default function Team({ loaderData, actionData }: Route.ComponentProps) {
  const { team, members, invitations, isOwner, userId } = loaderData;
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(inviteSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: teamActionSchema }),
  });
  return (
    <>
      <PageHeader
        title={team.teamName}
        lead="Your team shares sites, kit plans, sourcing and quotes. Nobody outside it can see them."
        actions={
          isOwner ? (
            <Link to="/team/api-keys" className="rounded-md border border-rule px-3 py-2 text-sm hover:bg-paper-deep">
              API keys
            </Link>
          ) : null
        }
      />
      <div className="grid gap-6 md:grid-cols-[2fr_1fr]">
        <Panel title={`Members (${members.length})`}>
          <ul className="divide-y divide-rule">
            {members.map((m) => (
              <li key={m.memberId} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <span>
                  <span className="font-medium">{m.name}</span> <span className="text-sm text-ink-faint">{m.email}</span>
                  <span className="ml-2 rounded border border-rule px-1.5 py-0.5 text-xs">{m.role === "owner" ? "owner" : "member"}</span>
                </span>
                {isOwner && m.userId !== userId ? (
                  <Form method="post">
                    <input type="hidden" name="intent" value="remove-member" />
                    <input type="hidden" name="memberId" value={m.memberId} />
                    <button type="submit" className="text-sm text-fail underline">
                      Remove
                    </button>
                  </Form>
                ) : null}
              </li>
            ))}
          </ul>
        </Panel>
        {isOwner ? (
          <Panel title="Invite a colleague">
            <Form method="post" {...getFormProps(form)} className="space-y-3">
              <input type="hidden" name="intent" value="invite" />
              <FormErrors errors={form.errors} />
              <TextField field={fields.email} label="Their e-mail" type="email" />
              <SubmitButton pending={navigation.state === "submitting"}>Send invitation</SubmitButton>
            </Form>
            <h3 className="mt-6 text-sm font-semibold">Waiting for an answer</h3>
            {invitations.length === 0 ? <p className="text-sm text-ink-faint">No open invitations.</p> : null}
            <ul className="mt-2 space-y-2 text-sm">
              {invitations.map((inv) => (
                <li key={inv.id} className="flex items-center justify-between gap-2">
                  <span>
                    {inv.email}
                    <span className="block text-xs text-ink-faint">valid until {new Date(inv.expiresAt).toISOString().slice(0, 10)}</span>
                  </span>
                  <Form method="post">
                    <input type="hidden" name="intent" value="cancel-invitation" />
                    <input type="hidden" name="invitationId" value={inv.id} />
                    <button type="submit" className="text-xs underline">
                      Withdraw
                    </button>
                  </Form>
                </li>
              ))}
            </ul>
          </Panel>
        ) : (
          <Panel title="Inviting colleagues">
            <p className="text-sm text-ink-soft">The team's owner invites and removes members.</p>
          </Panel>
        )}
      </div>
    </>
  );
}
