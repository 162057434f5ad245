// The production server as deployed: two instances on one PostgreSQL behind a (simulated) load
// balancer share sessions and attempt limits and refuse cross-site writes; when PostgreSQL stops,
// both answer 503 at once (page or JSON), stay up, and serve again by themselves when it returns.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Stripe from "stripe";
import { openDatabase } from "./helpers/access-world";
import { call, cookiesOf, type CallOptions } from "./helpers/http";
import { PUBLIC_HOST, PUBLIC_URL, startThrowawayStack } from "./helpers/throwaway-stack";
import { SIGN_IN_LIMITS } from "~/server/auth-attempts.server";

let stack: Awaited<ReturnType<typeof startThrowawayStack>>;
let a: number;
let b: number;
const email = `two-instances-${Date.now().toString(36)}@test.example`;
const password = "correct-horse-battery";
let cookie = "";

const get = (port: number, path: string, options: CallOptions = {}) => call(port, PUBLIC_HOST, path, options);
const postForm = (port: number, path: string, form: Record<string, string>, headers: Record<string, string> = {}) =>
  call(port, PUBLIC_HOST, path, { form, headers: { Origin: PUBLIC_URL, ...headers } });

beforeAll(async () => {
  stack = await startThrowawayStack(2);
  [a, b] = stack.instances.map((instance) => instance.port);
  const signUp = await postForm(a, "/sign-up", { name: "Twin Instance", email, password });
  expect(signUp.status, signUp.body.slice(0, 300)).toBe(302);
  cookie = cookiesOf(signUp);
}, 120_000);

afterAll(async () => {
  await stack?.stop();
});

describe("two instances, one database", () => {
  it("a session made on one instance is signed in on the other", async () => {
    expect(cookie).toMatch(/better-auth\.session_token=/);
    const me = await get(b, "/api/v1/me", { headers: { Cookie: cookie } });
    expect(me.status).toBe(200);
    expect(JSON.parse(me.body).user.email).toBe(email);
    const page = await get(b, "/team/new", { headers: { Cookie: cookie } });
    expect(page.status).toBe(200);
    expect(page.body).toContain("Twin Instance");
  });

  it("sets the session cookie HttpOnly and SameSite=Lax", async () => {
    const signIn = await postForm(b, "/sign-in", { email, password });
    expect(signIn.status).toBe(302);
    const line = (signIn.headers["set-cookie"] ?? []).find((c) => c.includes("session_token="))!;
    expect(line).toMatch(/;\s*HttpOnly/i);
    expect(line).toMatch(/;\s*SameSite=Lax/i);
  });

  it("counts sign-in failures on both instances against one limit", async () => {
    const max = SIGN_IN_LIMITS.perAccount.max;
    for (let i = 0; i < max; i++) {
      const attempt = await postForm(i % 2 === 0 ? a : b, "/sign-in", { email, password: "not-the-password" });
      expect(attempt.status).toBe(401);
    }
    for (const port of [a, b]) {
      const refused = await postForm(port, "/sign-in", { email, password });
      expect(refused.status).toBe(429);
      expect(Number(refused.headers["retry-after"])).toBeGreaterThan(0);
      expect(refused.body).toContain("Too many sign-in attempts; try again in 15 minutes.");
    }
  });

  it("refuses cross-site writes before any route, except the payments webhook and API keys", async () => {
    const evil = { Origin: "https://evil.example" };
    expect((await postForm(a, "/sign-out", {}, { ...evil, Cookie: cookie })).status).toBe(403);
    const api = await call(b, PUBLIC_HOST, "/api/v1/sites", { json: {}, headers: { ...evil, Cookie: cookie } });
    expect(api.status).toBe(403);
    expect(JSON.parse(api.body).error.message).toMatch(/evil\.example/);
    expect((await call(a, PUBLIC_HOST, "/sign-out", { method: "POST", headers: { Cookie: cookie } })).status).toBe(403);
    // Past the guard: the route itself answers (unknown key → 401; webhook → anything but 403).
    expect((await call(a, PUBLIC_HOST, "/api/v1/sites", { json: {}, headers: { Authorization: "Bearer kw_not_a_real_key" } })).status).toBe(401);
    expect((await call(b, PUBLIC_HOST, "/api/v1/payments/webhook", { json: {} })).status).not.toBe(403);
    // Still signed in: the refused sign-out did nothing.
    expect((await get(a, "/api/v1/me", { headers: { Cookie: cookie } })).status).toBe(200);
  });
});

describe("payments webhook on two instances", () => {
  it("records one event however many times, and on whichever instance, it is delivered; forged → 400 on both", async () => {
    const event = {
      id: `evt_test_twin_${Date.now().toString(36)}`,
      object: "event",
      type: "checkout.session.completed",
      created: Math.floor(Date.now() / 1000),
      data: { object: { id: `cs_test_twin_${Date.now().toString(36)}`, object: "checkout.session", payment_status: "paid", status: "complete", metadata: {} } },
    };
    const payload = JSON.stringify(event);
    const deliver = (port: number, secret = "whsec_local_fake_secret") =>
      // call() sends JSON.stringify(event): the very bytes signed here.
      call(port, PUBLIC_HOST, "/api/v1/payments/webhook", {
        json: event,
        headers: { "Stripe-Signature": Stripe.webhooks.generateTestHeaderString({ payload, secret }) },
      });
    const answers = await Promise.all(Array.from({ length: 10 }, (_, i) => deliver(i % 2 === 0 ? a : b)));
    expect(answers.map((x) => x.status)).toEqual(Array(10).fill(200));
    const db = openDatabase(stack.databaseUrl);
    try {
      const rows = await db.selectFrom("payment_webhook_event").selectAll().where("event_id", "=", event.id).execute();
      expect(rows).toHaveLength(1);
      expect(await db.selectFrom("quote_payment").select("id").execute()).toEqual([]);
    } finally {
      await db.destroy();
    }
    for (const port of [a, b]) expect((await deliver(port, "whsec_forged_secret")).status).toBe(400);
  });
});

describe("database outage", () => {
  it("answers 503 at once while PostgreSQL is down, and serves again by itself when it returns", async () => {
    for (const port of [a, b]) expect((await get(port, "/readyz")).status).toBe(200);

    stack.stopDatabase();
    const downAt = performance.now();
    const slowest: number[] = [];
    for (const port of [a, b]) {
      const page = await get(port, "/sites", { headers: { Cookie: cookie } });
      expect(page.status).toBe(503);
      expect(page.headers["content-type"]).toMatch(/text\/html/);
      expect(page.body).toContain("Briefly unavailable");
      expect(page.body).toContain("cannot reach its database");

      const api = await get(port, "/api/v1/me", { headers: { Cookie: cookie } });
      expect(api.status).toBe(503);
      expect(api.headers["retry-after"]).toBe("5");
      expect(JSON.parse(api.body).error.message).toMatch(/cannot reach its database/);

      const action = await postForm(port, "/sign-in", { email, password });
      expect(action.status).toBe(503);

      const ready = await get(port, "/readyz");
      expect(ready.status).toBe(503);
      expect(JSON.parse(ready.body).database).toBe("unreachable");
      expect((await get(port, "/healthz")).status).toBe(200);
      slowest.push(Math.max(page.ms, api.ms, action.ms, ready.ms));
    }
    const firstAnswersMs = performance.now() - downAt;

    stack.startDatabase();
    const upAt = performance.now();
    const recoveredMs: number[] = [];
    for (const port of [a, b]) {
      while ((await get(port, "/readyz")).status !== 200) {
        if (performance.now() - upAt > 15_000) throw new Error(`instance :${port} did not recover within 15 s`);
        await new Promise((r) => setTimeout(r, 100));
      }
      recoveredMs.push(performance.now() - upAt);
      expect((await get(port, "/api/v1/me", { headers: { Cookie: cookie } })).status).toBe(200);
      expect((await get(port, "/sites", { headers: { Cookie: cookie } })).status).not.toBe(503);
    }
    for (const instance of stack.instances) expect(instance.child.exitCode, instance.output.join("")).toBeNull();
    console.log(
      `outage: slowest 503 answer ${Math.max(...slowest).toFixed(0)} ms; all checks on both instances ${firstAnswersMs.toFixed(0)} ms; ` +
        `serving again ${recoveredMs.map((ms) => ms.toFixed(0)).join(" / ")} ms after PostgreSQL started`,
    );
  });
});
