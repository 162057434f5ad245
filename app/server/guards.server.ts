// Guards called at the top of every loader and action that touches private data. A layout's guard
// does not protect a child loader (single fetch can call one alone), so each route calls its own.
import { redirect } from "react-router";
import { auth, type Session } from "./auth.server";
import { db } from "./db.server";
import { findTeamByApiKey } from "./api-keys.server";
import { isRole, type Role } from "~/lib/roles";

export type SignedInUser = Session["user"] & { role: Role };

export interface TeamMembership {
  teamId: string;
  teamName: string;
  membershipRole: string;
}

export async function getSessionUser(request: Request): Promise<SignedInUser | null> {
  const session = await auth.api.getSession({ headers: request.headers });
  if (!session || session.user.banned) return null;
  return { ...session.user, role: isRole(session.user.role) ? session.user.role : "installer" };
}

function signInRedirect(request: Request) {
  const url = new URL(request.url);
  const back = url.pathname.endsWith(".data") ? url.pathname.slice(0, -5) : url.pathname;
  return redirect(`/sign-in?redirectTo=${encodeURIComponent(back + url.search)}`);
}

export async function requireUser(request: Request) {
  const user = await getSessionUser(request);
  if (!user) throw signInRedirect(request);
  return user;
}

export function forbidden(message = "Your account does not have access to this page. If you think it should, ask your team's owner or the service admin.") {
  return new Response(message, { status: 403, statusText: "Forbidden" });
}

export async function requireRole(request: Request, ...roles: Role[]) {
  const user = await requireUser(request);
  if (!roles.includes(user.role)) throw forbidden();
  return user;
}

export async function findMembership(userId: string): Promise<TeamMembership | null> {
  const row = await db
    .selectFrom("member")
    .innerJoin("organization", "organization.id", "member.organizationId")
    .select(["organization.id as teamId", "organization.name as teamName", "member.role as membershipRole"])
    .where("member.userId", "=", userId)
    .orderBy("member.createdAt")
    .executeTakeFirst();
  return row ?? null;
}

/** An installer with a team. Without a team yet, they are sent to name one. */
/** Everyone who works with the catalogue and the planner: not customers. */
export function requireStaff(request: Request) {
  return requireRole(request, "installer", "curator", "admin");
}

export async function requireTeamMember(request: Request) {
  const user = await requireRole(request, "installer");
  const team = await findMembership(user.id);
  if (!team) throw redirect("/team/new");
  return { user, team };
}

export async function requireTeamOwner(request: Request) {
  const { user, team } = await requireTeamMember(request);
  if (team.membershipRole !== "owner") throw forbidden("Only the team's owner can do this.");
  return { user, team };
}

/** The actor behind an /api/v1 request: a team API key or a signed-in user. Anonymous → 401 JSON. */
export type ApiActor = { kind: "api-key"; teamId: string; keyId: string } | { kind: "user"; user: SignedInUser; teamId: string | null };

/**
 * Customers see nothing but the quotes sent to them (brief, "Who uses it"): the API and the shared
 * catalogue serve installers, curators and admins. Only /api/v1/me lets a customer ask who they are.
 */
export async function requireApiActor(request: Request, { allowCustomers = false } = {}): Promise<ApiActor> {
  const authorization = request.headers.get("Authorization");
  if (authorization?.startsWith("Bearer ")) {
    const key = await findTeamByApiKey(authorization.slice("Bearer ".length).trim());
    if (!key) throw Response.json({ error: { message: "The API key is unknown or revoked." } }, { status: 401 });
    return { kind: "api-key", teamId: key.teamId, keyId: key.keyId };
  }
  const user = await getSessionUser(request);
  if (!user) throw Response.json({ error: { message: "Sign in or send a team API key (Authorization: Bearer …)." } }, { status: 401 });
  if (user.role === "customer" && !allowCustomers) {
    throw Response.json(
      { error: { message: "Customer accounts read the quotes sent to them at /my-quotes; the API serves installer teams." } },
      { status: 403 },
    );
  }
  const team = user.role === "installer" ? await findMembership(user.id) : null;
  return { kind: "user", user, teamId: team?.teamId ?? null };
}

/** The team an API request acts for; customers, curators and admins have none → 403 JSON. */
export async function requireApiTeam(request: Request) {
  const actor = await requireApiActor(request);
  if (!actor.teamId)
    throw Response.json(
      { error: { message: "This endpoint serves installer teams: sign in as an installer with a team, or use a team API key." } },
      { status: 403 },
    );
  return { actor, teamId: actor.teamId, userId: actor.kind === "user" ? actor.user.id : null };
}
