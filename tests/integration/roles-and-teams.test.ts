import { describe, expect, it } from "vitest";
import { RouteClient } from "./helpers/route-client";
import { firstLink, installerWithTeam, latestMailTo, PASSWORD, signUpUser, userWithRole } from "./helpers/fixtures";
import * as adminUsers from "~/routes/admin-users";
import * as team from "~/routes/team";
import * as teamApiKeys from "~/routes/team-api-keys";
import * as invitation from "~/routes/invitation";
import * as signUp from "~/routes/sign-up";
import * as sites from "~/routes/sites";
import { db } from "~/server/db.server";

describe("roles", () => {
  it("sends anonymous visitors to sign in, and gives a customer 403 on the admin page", async () => {
    const anonymous = await new RouteClient().loader(adminUsers, "/admin/users");
    expect(anonymous.status).toBe(302);
    expect(anonymous.location).toBe("/sign-in?redirectTo=%2Fadmin%2Fusers");
    const customer = await userWithRole("customer");
    expect((await customer.client.loader(adminUsers, "/admin/users")).status).toBe(403);
    const installer = await installerWithTeam("not-admin");
    expect((await installer.client.loader(adminUsers, "/admin/users")).status).toBe(403);
    expect((await installer.client.action(adminUsers, "/admin/users", { userId: installer.userId, role: "admin" })).status).toBe(403);
  });

  it("lets an admin list users and change a role, and refuses unknown roles", async () => {
    const admin = await userWithRole("admin");
    const target = await signUpUser("promote");
    const list = await admin.client.loader(adminUsers, `/admin/users?q=${encodeURIComponent(target.email)}`);
    expect(list.status).toBe(200);
    expect(list.data.rows.map((r: { email: string }) => r.email)).toEqual([target.email]);
    expect((await admin.client.action(adminUsers, "/admin/users", { userId: target.userId, role: "overlord" })).status).toBe(400);
    expect((await admin.client.action(adminUsers, "/admin/users", { userId: target.userId, role: "curator" })).status).toBe(302);
    const row = await db.selectFrom("user").select("role").where("id", "=", target.userId).executeTakeFirstOrThrow();
    expect(row.role).toBe("curator");
  });

  it("keeps customers and curators out of team pages", async () => {
    const customer = await userWithRole("customer", "cust-team");
    expect((await customer.client.loader(team, "/team")).status).toBe(403);
    const curator = await userWithRole("curator", "cur-team");
    expect((await curator.client.loader(teamApiKeys, "/team/api-keys")).status).toBe(403);
  });
});

describe("teams and invitations", () => {
  it("invites a colleague by e-mail; they sign up from the link, accept and see the team", async () => {
    const owner = await installerWithTeam("owner");
    const colleagueEmail = `colleague-${Date.now()}@test.example`;
    const invite = await owner.client.action(team, "/team", { intent: "invite", email: colleagueEmail });
    expect(invite.status, JSON.stringify(invite.data)).toBe(302);

    const mail = await latestMailTo(colleagueEmail);
    expect(mail.subject).toContain(owner.teamName);
    const link = firstLink(mail.text, "/invitations/");
    const invitationId = link.pathname.split("/").pop()!;

    const colleague = new RouteClient();
    const before = await colleague.loader(invitation, link.pathname, { invitationId });
    expect(before.data.teamName).toBe(owner.teamName);
    expect(before.data.signedInAs).toBeNull();
    const signed = await colleague.action(signUp, "/sign-up", { name: "New Colleague", email: colleagueEmail, password: PASSWORD, redirectTo: link.pathname });
    expect(signed.location).toBe(link.pathname);
    const accepted = await colleague.action(invitation, link.pathname, {}, { invitationId });
    expect(accepted.status, JSON.stringify(accepted.data)).toBe(302);

    const page = await colleague.loader(team, "/team");
    expect(page.data.team.teamName).toBe(owner.teamName);
    expect(page.data.members.map((m: { email: string }) => m.email).sort()).toEqual([colleagueEmail, owner.email].sort());
    expect(page.data.isOwner).toBe(false);
    // A member cannot invite or remove: only the owner can.
    expect((await colleague.action(team, "/team", { intent: "invite", email: "x@test.example" })).status).toBe(403);
  });

  it("refuses an invitation to someone signed in with another e-mail address", async () => {
    const owner = await installerWithTeam("owner2");
    await owner.client.action(team, "/team", { intent: "invite", email: `intended-${Date.now()}@test.example` });
    const inv = await db.selectFrom("invitation").select("id").where("organizationId", "=", owner.teamId).executeTakeFirstOrThrow();
    const stranger = await signUpUser("stranger");
    const result = await stranger.client.action(invitation, `/invitations/${inv.id}`, {}, { invitationId: inv.id });
    expect(result.status).toBe(403);
    const members = await db.selectFrom("member").select("userId").where("organizationId", "=", owner.teamId).execute();
    expect(members.map((m) => m.userId)).not.toContain(stranger.userId);
  });

  it("lets the owner remove a member, who then loses the team's pages", async () => {
    const owner = await installerWithTeam("remover");
    const mate = await signUpUser("removed-mate");
    await owner.client.action(team, "/team", { intent: "invite", email: mate.email });
    const inv = await db.selectFrom("invitation").select("id").where("organizationId", "=", owner.teamId).executeTakeFirstOrThrow();
    expect((await mate.client.action(invitation, `/invitations/${inv.id}`, {}, { invitationId: inv.id })).status).toBe(302);
    expect((await mate.client.loader(sites, "/sites")).status).toBe(200);
    const member = await db
      .selectFrom("member")
      .select("id")
      .where("organizationId", "=", owner.teamId)
      .where("userId", "=", mate.userId)
      .executeTakeFirstOrThrow();

    const removed = await owner.client.action(team, "/team", { intent: "remove-member", memberId: member.id });
    expect(removed.status, JSON.stringify(removed.data)).toBe(302);
    expect(await db.selectFrom("member").select("id").where("id", "=", member.id).executeTakeFirst()).toBeUndefined();
    const ownerView = await owner.client.loader(team, "/team");
    expect(ownerView.data.members.map((m: { email: string }) => m.email)).toEqual([owner.email]);
    // The former member has no team any more: team pages send them to start one of their own.
    for (const [mod, path] of [
      [team, "/team"],
      [sites, "/sites"],
    ] as const) {
      const page = await mate.client.loader(mod, path);
      expect(page.status, path).toBe(302);
      expect(page.location, path).toBe("/team/new");
    }
  });

  it("lets the owner withdraw a pending invitation, whose link then refuses", async () => {
    const owner = await installerWithTeam("withdrawer");
    const inviteeEmail = `withdrawn-${Date.now()}@test.example`;
    await owner.client.action(team, "/team", { intent: "invite", email: inviteeEmail });
    const link = firstLink((await latestMailTo(inviteeEmail)).text, "/invitations/");
    const invitationId = link.pathname.split("/").pop()!;

    const cancel = await owner.client.action(team, "/team", { intent: "cancel-invitation", invitationId });
    expect(cancel.status, JSON.stringify(cancel.data)).toBe(302);
    expect((await owner.client.loader(team, "/team")).data.invitations).toHaveLength(0);

    const invitee = new RouteClient();
    expect((await invitee.loader(invitation, link.pathname, { invitationId })).data.open).toBe(false);
    await invitee.action(signUp, "/sign-up", { name: "Too Late", email: inviteeEmail, password: PASSWORD, redirectTo: link.pathname });
    const accept = await invitee.action(invitation, link.pathname, {}, { invitationId });
    expect(accept.status).toBe(410);
    const members = await db.selectFrom("member").select("userId").where("organizationId", "=", owner.teamId).execute();
    expect(members).toHaveLength(1);
  });

  it("never shows or changes one team's data to another team's installer", async () => {
    const a = await installerWithTeam("team-a");
    const b = await installerWithTeam("team-b");
    await a.client.action(team, "/team", { intent: "invite", email: `a-invitee-${Date.now()}@test.example` });
    await a.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "A's sync" });
    const aInvitation = await db.selectFrom("invitation").select("id").where("organizationId", "=", a.teamId).executeTakeFirstOrThrow();
    const aKey = await db.selectFrom("team_api_key").select("id").where("team_id", "=", a.teamId).executeTakeFirstOrThrow();
    const aMember = await db.selectFrom("member").select("id").where("organizationId", "=", a.teamId).executeTakeFirstOrThrow();

    const bTeam = await b.client.loader(team, "/team");
    expect(JSON.stringify(bTeam.data)).not.toContain(a.email);
    expect(JSON.stringify(bTeam.data)).not.toContain(a.teamName);
    const bKeys = await b.client.loader(teamApiKeys, "/team/api-keys");
    expect(bKeys.data.keys).toHaveLength(0);

    expect((await b.client.action(teamApiKeys, "/team/api-keys", { intent: "revoke", keyId: aKey.id })).status).toBe(404);
    expect((await b.client.action(team, "/team", { intent: "remove-member", memberId: aMember.id })).status).toBe(404);
    const cancel = await b.client.action(team, "/team", { intent: "cancel-invitation", invitationId: aInvitation.id });
    expect(cancel.status).toBeGreaterThanOrEqual(400);

    const key = await db.selectFrom("team_api_key").select("revoked_at").where("id", "=", aKey.id).executeTakeFirstOrThrow();
    expect(key.revoked_at).toBeNull();
    const inv = await db.selectFrom("invitation").select("status").where("id", "=", aInvitation.id).executeTakeFirstOrThrow();
    expect(inv.status).toBe("pending");
    expect(await db.selectFrom("member").select("id").where("id", "=", aMember.id).executeTakeFirst()).toBeTruthy();
  });
});
