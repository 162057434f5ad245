import { describe, expect, it, vi } from "vitest";
import { RouteClient } from "./helpers/route-client";
import { installerWithTeam, signUpUser } from "./helpers/fixtures";
import { auth } from "~/server/auth.server";
import * as teamApiKeys from "~/routes/team-api-keys";
import * as me from "~/routes/api.v1.me";
import { db } from "~/server/db.server";
import { createApiKey } from "~/server/api-keys.server";

async function callMe(headers: Record<string, string>) {
  const client = new RouteClient();
  const request = client.request("/api/v1/me", { headers });
  try {
    return await me.loader({ request, params: {}, context: {} } as never);
  } catch (thrown) {
    if (thrown instanceof Response) return thrown;
    throw thrown;
  }
}

describe("team API keys", () => {
  it("shows a new key once, stores only its hash, lets it act as the team, and refuses it once revoked", async () => {
    const owner = await installerWithTeam("keys");
    const created = await owner.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Stock sync" });
    expect(created.status).toBe(200);
    const key: string = created.data.created.key;
    expect(key).toMatch(/^kw_[A-Za-z0-9_-]{43}$/);

    const stored = await db.selectFrom("team_api_key").selectAll().where("team_id", "=", owner.teamId).executeTakeFirstOrThrow();
    expect(JSON.stringify(stored)).not.toContain(key);
    const listed = await owner.client.loader(teamApiKeys, "/team/api-keys");
    expect(JSON.stringify(listed.data)).not.toContain(key);

    const ok = await callMe({ Authorization: `Bearer ${key}` });
    expect(ok.status).toBe(200);
    expect(await ok.json()).toEqual({ kind: "api-key", teamId: owner.teamId });

    expect((await owner.client.action(teamApiKeys, "/team/api-keys", { intent: "revoke", keyId: stored.id })).status).toBe(302);
    const refused = await callMe({ Authorization: `Bearer ${key}` });
    expect(refused.status).toBe(401);
    expect((await refused.json()).error.message).toMatch(/revoked/);
  });

  it("stops accepting a key revoked by another instance within five seconds", async () => {
    const owner = await installerWithTeam("keys4");
    const { id, key } = await createApiKey(owner.teamId, "Shared integration", owner.userId);
    expect((await callMe({ Authorization: `Bearer ${key}` })).status).toBe(200);
    // What another instance's revocation leaves behind: the row changed, this process not told.
    await db.updateTable("team_api_key").set({ revoked_at: new Date() }).where("id", "=", id).execute();
    vi.useFakeTimers({ toFake: ["Date"], now: Date.now() + 5_001 });
    try {
      expect((await callMe({ Authorization: `Bearer ${key}` })).status).toBe(401);
    } finally {
      vi.useRealTimers();
    }
  });

  it("answers 401 JSON to anonymous and made-up keys, and a bad key id gets a field error, not a crash", async () => {
    expect((await callMe({})).status).toBe(401);
    expect((await callMe({ Authorization: "Bearer kw_madeup" })).status).toBe(401);
    const owner = await installerWithTeam("keys2");
    expect((await owner.client.action(teamApiKeys, "/team/api-keys", { intent: "revoke", keyId: "not-a-uuid" })).status).toBe(400);
    expect((await owner.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "" })).status).toBe(400);
  });

  it("lets only the team's owner manage keys", async () => {
    const owner = await installerWithTeam("keys3");
    const member = await signUpUser("keys3-member");
    await auth.api.addMember({ body: { userId: member.userId, organizationId: owner.teamId, role: "member" } });
    expect((await member.client.loader(teamApiKeys, "/team/api-keys")).status).toBe(403);
    expect((await member.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Sneaky" })).status).toBe(403);
  });
});
