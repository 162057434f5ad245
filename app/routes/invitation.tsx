import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/invitation";
import { FormErrors, SubmitButton } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { auth } from "~/server/auth.server";
import { authErrorMessage } from "~/server/auth-errors.server";
import { redirectWithFlash } from "~/server/flash.server";
import { findMembership, getSessionUser, requireRole } from "~/server/guards.server";
import { findInvitation } from "~/server/teams.server";

export const meta: Route.MetaFunction = () => [{ title: "Team invitation · Kitwright" }];

async function loadOpenInvitation(invitationId: string) {
  const invitation = await findInvitation(invitationId);
  if (!invitation) throw new Response("This invitation does not exist.", { status: 404 });
  const open = invitation.status === "pending" && new Date(invitation.expiresAt) > new Date();
  return { invitation, open };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  // The invitation id is an unguessable token sent by e-mail: holding it shows the team's name.
  const { invitation, open } = await loadOpenInvitation(params.invitationId);
  const user = await getSessionUser(request);
  const team = user ? await findMembership(user.id) : null;
  return {
    teamName: invitation.teamName,
    inviterName: invitation.inviterName,
    email: invitation.email,
    open,
    signedInAs: user?.email ?? null,
    emailMatches: user?.email.toLowerCase() === invitation.email.toLowerCase(),
    currentTeam: team?.teamName ?? null,
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, "installer");
  const { invitation, open } = await loadOpenInvitation(params.invitationId);
  if (!open) return data({ error: "This invitation is no longer open. Ask the team's owner for a new one." }, { status: 410 });
  if (await findMembership(user.id)) return data({ error: "You already belong to a team. One account works in one team." }, { status: 409 });
  try {
    await auth.api.acceptInvitation({ body: { invitationId: invitation.id }, headers: request.headers });
  } catch (error) {
    const message = authErrorMessage(error);
    if (!message) throw error;
    return data({ error: message }, { status: 403 });
  }
  return redirectWithFlash("/team", { kind: "success", message: `Welcome to ${invitation.teamName}.` });
}

export default function Invitation({ loaderData, actionData, params }: Route.ComponentProps) {
  const navigation = useNavigation();
  const here = `/invitations/${params.invitationId}`;
  const l = loaderData;
  return (
    <div className="mx-auto max-w-md">
      <Panel title={`Join ${l.teamName}`}>
        <p className="mb-4 text-ink-soft">
          {l.inviterName} invited <strong>{l.email}</strong> to join the team <strong>{l.teamName}</strong> on Kitwright.
        </p>
        {actionData?.error ? <FormErrors errors={[actionData.error]} /> : null}
        {!l.open ? (
          <FormErrors errors={["This invitation is no longer open (accepted, withdrawn or expired). Ask the team's owner for a new one."]} />
        ) : !l.signedInAs ? (
          <div className="flex flex-wrap gap-3">
            <Link to={`/sign-up?redirectTo=${encodeURIComponent(here)}`} className="rounded-md bg-copper px-4 py-2 font-medium text-sheet">
              Create an account
            </Link>
            <Link to={`/sign-in?redirectTo=${encodeURIComponent(here)}`} className="rounded-md border border-rule px-4 py-2">
              I have an account
            </Link>
          </div>
        ) : !l.emailMatches ? (
          <FormErrors errors={[`You are signed in as ${l.signedInAs}. Sign out and sign in (or create an account) as ${l.email} to accept.`]} />
        ) : l.currentTeam ? (
          <FormErrors errors={[`You already belong to ${l.currentTeam}. One account works in one team.`]} />
        ) : (
          <Form method="post">
            <SubmitButton pending={navigation.state === "submitting"}>Join {l.teamName}</SubmitButton>
          </Form>
        )}
      </Panel>
    </div>
  );
}
