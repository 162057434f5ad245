// Every route of app/routes.ts, visited over HTTP on the production server by every kind of visitor
// (anonymous, a customer, the quote's own customer, an installer with no team, another team's owner,
// team A's member and owner, a curator, an admin): the answer is what access-matrix.table.ts says,
// for GET, for the page's single-fetch `.data` twin and for POST. Nowhere may anyone read a word of
// another team's or another customer's data; guessed ids and writes aimed at them are not found.
import type { Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { accessTable, type AccessCase } from "./access-matrix.table";
import { dataUrl, type Outcome } from "./helpers/access-check";
import { createRunner, type Probe } from "./helpers/access-runner";
import { ACTORS, buildWorld, openDatabase, seedDemo, signIn, type Actor, type World } from "./helpers/access-world";
import { appRoutes, patternMatches, type AppRoute } from "./helpers/route-table";
import { startThrowawayStack } from "./helpers/throwaway-stack";
import type { Database } from "~/server/db-schema";

let stack: Awaited<ReturnType<typeof startThrowawayStack>>;
let db: Kysely<Database>;
let world: World;
let port: number;
let routes: AppRoute[];
let table: AccessCase[];

beforeAll(async () => {
  stack = await startThrowawayStack(1);
  port = stack.instances[0].port;
  seedDemo(stack.databaseUrl);
  db = openDatabase(stack.databaseUrl);
  world = await buildWorld(port, db);
  routes = appRoutes();
  table = accessTable(world);
}, 180_000);

afterAll(async () => {
  await db?.destroy();
  await stack?.stop();
});

describe("the access table", () => {
  it("has a row for every route of app/routes.ts, a POST row for every route with an action, and none for a route without", () => {
    const patterns = new Set(routes.map((r) => r.pattern));
    expect(routes.length).toBeGreaterThan(60);
    expect(routes.filter((r) => !table.some((c) => c.pattern === r.pattern)).map((r) => `${r.pattern} (${r.file})`)).toEqual([]);
    expect(table.filter((c) => !patterns.has(c.pattern)).map((c) => c.pattern)).toEqual([]);
    expect(table.filter((c) => !patternMatches(c.pattern, new URL(c.url, "http://x").pathname)).map((c) => `${c.pattern} ≠ ${c.url}`)).toEqual([]);
    const withAction = routes.filter((r) => r.hasAction);
    expect(withAction.filter((r) => !table.some((c) => c.pattern === r.pattern && c.post)).map((r) => r.pattern)).toEqual([]);
    expect(table.filter((c) => c.post && !routes.find((r) => r.pattern === c.pattern)?.hasAction).map((c) => c.pattern)).toEqual([]);
  });
});

describe("every route, every visitor", () => {
  it("answers as the table says (GET, single-fetch .data, POST), with no 5xx and no other team's or customer's words", async () => {
    const started = performance.now();
    const runner = createRunner(port, world);
    const probes: Probe[] = [];
    const spent: Probe[] = [];
    for (const c of table) {
      const route = routes.find((r) => r.pattern === c.pattern)!;
      for (const actor of ACTORS) {
        const mayShow = c.mayShow;
        probes.push({ actor, method: "GET", url: c.url, expect: c.get[actor], mayShow });
        if (route.isPage) probes.push({ actor, method: "GET", url: dataUrl(c.url), pageUrl: c.url, expect: c.get[actor], mayShow });
        if (!c.post) continue;
        const post: Probe = { actor, method: "POST", url: c.url, body: c.post.body, expect: c.post.expect[actor], mayShow };
        if (c.post.spendsSession) spent.push(post);
        else probes.push(post);
      }
    }
    await runner.probeAll(probes);
    // Signing out spends a session of its own, which is then gone.
    for (const post of spent) {
      const cookie = post.actor === "anonymous" ? "" : await signIn(port, world.emails[post.actor]);
      await runner.probe({ ...post, cookie });
      if (cookie) await runner.probe({ actor: post.actor, cookie, method: "GET", url: "/api/v1/me", expect: 401 });
    }
    const { GET, DATA, POST, slowest, slowestMs } = runner.tally;
    console.log(
      `access matrix: ${routes.length} routes in ${table.length} rows × ${ACTORS.length} visitors = ${GET} GET + ${DATA} .data + ${POST} POST ` +
        `in ${((performance.now() - started) / 1000).toFixed(1)} s (slowest ${slowestMs.toFixed(0)} ms: ${slowest})`,
    );
    expect(runner.problems).toEqual([]);
  }, 300_000);
});

describe("another team's and another customer's data", () => {
  const BOGUS = ["00000000-0000-4000-8000-000000000000", "not-an-id", "1'%20OR%20'1'='1", "x".repeat(300)];

  it("is not found by guessing its ids: in paths, query strings, single fetch of one route's loader, and with a team API key", async () => {
    const runner = createRunner(port, world);
    const { ids } = world;
    const guess = (actor: Actor, url: string, expected: Outcome, headers?: Record<string, string>): Probe => ({
      actor,
      method: "GET",
      url,
      expect: expected,
      headers,
      ...(headers ? { cookie: "" } : {}),
    });
    const keyB = { Authorization: `Bearer ${world.apiKeys.teamB}` };
    const keyA = { Authorization: `Bearer ${world.apiKeys.teamA}` };
    const probes: Probe[] = [
      guess("otherTeam", `/quotes/${ids.sentQuote}.data?_routes=routes/quote`, 404),
      guess("otherTeam", `/quotes/${ids.draftQuote}/print.data?revision=1`, 404),
      guess("otherTeam", `/sites/${ids.site}.data?_routes=routes/site`, 404),
      guess("otherTeam", `/sites/${ids.site}/loads/${ids.sheet}.data?_routes=routes/load-sheet`, 404),
      guess("otherTeam", `/readings/${ids.readingA}.data?_routes=routes/reading`, 404),
      guess("otherTeam", `/plans/${ids.plan}/alternatives.data?_routes=routes/plan-alternatives`, 404),
      guess("otherTeam", `/sourcing/suppliers/${ids.supplier}.data`, 404),
      guess("otherTeam", `/sourcing/compare/modules.data?plan=${ids.plan}&filled=1`, 404),
      // A search for the start of team A's quote title (the page echoes the search, not the title).
      guess("otherTeam", "/quotes.data?q=CanarySentQuote", 200),
      guess("otherTeam", "/api/v1/quotes?q=CanarySentQuote", 200, keyB),
      guess("otherTeam", `/api/v1/quotes/${ids.sentQuote}`, 404, keyB),
      guess("otherTeam", `/api/v1/quotes/${ids.draftQuote}?revision=1`, 404),
      guess("otherTeam", `/api/v1/offers?supplierId=${ids.supplier}`, 200),
      guess("otherTeam", `/api/v1/plans/${ids.plan}?revision=1`, 404),
      guess("customer", `/my-quotes/${ids.sentQuote}.data?_routes=routes/my-quote`, 404),
      guess("customer", `/my-quotes/${ids.sentQuote}/print.data`, 404),
      guess("member", `/my-quotes/${ids.sentQuote}.data`, 404),
      guess("otherTeam", "/api/v1/me", 200, keyB),
      guess("otherTeam", "/api/v1/sites", 200, keyB),
      guess("otherTeam", "/api/v1/plans", 200, keyB),
      guess("otherTeam", "/api/v1/offers", 200, keyB),
      guess("otherTeam", "/api/v1/readings", 200, keyB),
      guess("otherTeam", `/api/v1/sites/${ids.site}`, 404, keyB),
      guess("otherTeam", `/api/v1/plans/${ids.plan}`, 404, keyB),
      guess("otherTeam", `/api/v1/offers/${ids.offer}`, 404, keyB),
      guess("owner", `/api/v1/sites/${ids.teamBSite}`, 404, keyA),
      { actor: "otherTeam", cookie: "", headers: keyB, method: "POST", url: `/api/v1/plans/${ids.plan}/alternatives`, body: { json: {} }, expect: 404 },
    ];
    const detail = [
      "/sites/",
      "/plans/",
      "/quotes/",
      "/api/v1/quotes/",
      "/sourcing/suppliers/",
      "/sourcing/offers/",
      "/readings/",
      "/files/",
      "/api/v1/sites/",
      "/api/v1/plans/",
      "/api/v1/offers/",
    ];
    for (const bogus of BOGUS) for (const prefix of detail) probes.push(guess("owner", `${prefix}${bogus}`, 404));
    for (const bogus of BOGUS) probes.push(guess("quoteCustomer", `/my-quotes/${bogus}`, 404), guess("otherTeam", `/quote-access/${bogus}`, 200));
    await runner.probeAll(probes);
    expect(runner.problems).toEqual([]);
    const offers = await runner.probe(guess("otherTeam", `/api/v1/offers?supplierId=${ids.supplier}`, 200));
    expect(JSON.parse(offers.body).items).toEqual([]);
  });

  it("refuses writes aimed at it as not found, and they change nothing", async () => {
    const runner = createRunner(port, world);
    const { ids } = world;
    const post = (actor: Actor, url: string, form: Record<string, string>, expected: Outcome = 404): Probe => ({
      actor,
      method: "POST",
      url,
      body: { form },
      expect: expected,
    });
    const pick = Object.fromEntries(Object.entries(world.pick).map(([k, v]) => [k, String(v)]));
    await runner.probeAll(
      [
        post("otherTeam", `/sites/${ids.site}`, { intent: "delete" }),
        post("otherTeam", `/sites/${ids.site}/loads/${ids.sheet}`, { intent: "delete" }),
        post("otherTeam", `/sourcing/suppliers/${ids.supplier}`, { intent: "delete" }),
        post("otherTeam", `/sourcing/offers/${ids.offer}`, { intent: "delete" }),
        post("otherTeam", "/sourcing/rates", { intent: "delete-rate", rateId: ids.rate }),
        post("otherTeam", `/quotes/${ids.sentQuote}`, { intent: "withdraw", reason: "Not ours" }),
        post("otherTeam", `/quotes/${ids.draftQuote}`, { intent: "send" }),
        post("otherTeam", `/plans/${ids.plan}`, { intent: "replan-current" }),
        post("otherTeam", `/plans/${ids.plan}/alternatives`, pick),
        post("otherTeam", "/team", { intent: "remove-member", memberId: ids.memberA }),
        post("otherTeam", "/team/api-keys", { intent: "revoke", keyId: ids.apiKeyA }),
        post("member", "/team/api-keys", { intent: "revoke", keyId: ids.apiKeyA }, 403),
        post("customer", `/my-quotes/${ids.sentQuote}`, { intent: "decline", comment: "Not my quote at all" }),
        post("customer", `/my-quotes/${ids.sentQuote}`, { intent: "approve", acceptedName: "Someone Else", confirm: "on" }),
        post("otherTeam", `/my-quotes/${ids.sentQuote}`, { intent: "pay" }),
      ],
      1,
    );
    expect(runner.problems).toEqual([]);

    const count = async (table: "site" | "load_sheet" | "supplier" | "offer" | "exchange_rate" | "member", id: string) =>
      (await db.selectFrom(table).select("id").where("id", "=", id).execute()).length;
    expect([
      await count("site", ids.site),
      await count("load_sheet", ids.sheet),
      await count("supplier", ids.supplier),
      await count("offer", ids.offer),
    ]).toEqual([1, 1, 1, 1]);
    expect([await count("exchange_rate", ids.rate), await count("member", ids.memberA)]).toEqual([1, 1]);
    const quotes = await db.selectFrom("quote").select(["id", "status", "decided_at"]).where("id", "in", [ids.sentQuote, ids.draftQuote]).execute();
    expect(quotes.find((q) => q.id === ids.draftQuote)?.status).toBe("draft");
    expect(["sent", "viewed"]).toContain(quotes.find((q) => q.id === ids.sentQuote)?.status);
    expect(quotes.find((q) => q.id === ids.sentQuote)?.decided_at).toBeNull();
    const plan = await db.selectFrom("kit_plan").select("latest_revision").where("id", "=", ids.plan).executeTakeFirstOrThrow();
    expect(plan.latest_revision).toBe(ids.planRevision);
    const key = await db.selectFrom("team_api_key").select("revoked_at").where("id", "=", ids.apiKeyA).executeTakeFirstOrThrow();
    expect(key.revoked_at).toBeNull();
  });
});
