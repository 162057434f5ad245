// The people and data the access matrix runs against: the demo scenario (team A = Tallowmere Power
// Works with sites, plans, offers, quotes and readings; team B = Brindlecombe Electric), plus a second
// customer and an installer without a team, all signed in over HTTP. Team A's private names get
// random "canary" words, so that a leak anywhere shows up as a canary in someone else's response.
import { spawnSync } from "node:child_process";
import { createHash, randomBytes } from "node:crypto";
import { Kysely, PostgresDialect, sql } from "kysely";
import pg from "pg";
import { expect } from "vitest";
import { DEMO_PASSWORD } from "../../../data/demo/people";
import type { Database } from "~/server/db-schema";
import { call, cookiesOf } from "./http";
import { PUBLIC_HOST, PUBLIC_URL } from "./throwaway-stack";

export const ACTORS = ["anonymous", "customer", "quoteCustomer", "noTeam", "otherTeam", "member", "owner", "curator", "admin"] as const;
export type Actor = (typeof ACTORS)[number];

const DEMO_EMAILS: Partial<Record<Actor, string>> = {
  quoteCustomer: "warden@vell-hut.example",
  otherTeam: "sefa@brindlecombe.example",
  member: "tobin@tallowmere.example",
  owner: "maren@tallowmere.example",
  curator: "curator@kitwright.example",
  admin: "admin@kitwright.example",
};

export function openDatabase(databaseUrl: string) {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 2 });
  // A test that stops PostgreSQL drops the pool's idle clients: that is expected, not a failure.
  pool.on("error", () => {});
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}

export function seedDemo(databaseUrl: string) {
  const seed = spawnSync("node_modules/.bin/tsx", ["scripts/seed.ts"], { env: { ...process.env, DATABASE_URL: databaseUrl }, encoding: "utf8" });
  if (seed.status !== 0) throw new Error(`demo seed failed: ${seed.stderr || seed.stdout}`);
}

export async function signIn(port: number, email: string, password = DEMO_PASSWORD) {
  const answer = await call(port, PUBLIC_HOST, "/sign-in", { form: { email, password }, headers: { Origin: PUBLIC_URL } });
  expect(answer.status, `sign-in of ${email}: ${answer.body.slice(0, 200)}`).toBe(302);
  return cookiesOf(answer);
}

async function signUp(port: number, label: string) {
  const email = `${label}-${randomBytes(4).toString("hex")}@test.example`;
  const answer = await call(port, PUBLIC_HOST, "/sign-up", {
    form: { name: `Matrix ${label}`, email, password: DEMO_PASSWORD },
    headers: { Origin: PUBLIC_URL },
  });
  expect(answer.status, answer.body.slice(0, 200)).toBe(302);
  return { email, cookie: cookiesOf(answer) };
}

const canary = (what: string) => `Canary${what}${randomBytes(5).toString("hex")}`;

/** Creates a team API key through the owner's page and reads it from the one answer that shows it. */
async function createApiKey(port: number, cookie: string) {
  const answer = await call(port, PUBLIC_HOST, "/team/api-keys", {
    form: { intent: "create", name: "Access matrix" },
    headers: { Origin: PUBLIC_URL, Cookie: cookie },
  });
  const key = answer.body.match(/kw_[A-Za-z0-9_-]{30,}/)?.[0];
  if (!key) throw new Error(`no API key in the answer (${answer.status})`);
  return key;
}

export async function buildWorld(port: number, db: Kysely<Database>) {
  const team = (slug: string) => db.selectFrom("organization").select(["id", "name"]).where("slug", "=", slug).executeTakeFirstOrThrow();
  const teamA = await team("tallowmere-power-works");
  const teamB = await team("brindlecombe-electric");
  const first = <T>(row: T | undefined, what: string) => {
    if (!row) throw new Error(`the demo data has no ${what}`);
    return row;
  };
  const site = first(await db.selectFrom("site").selectAll().where("team_id", "=", teamA.id).executeTakeFirst(), "site of team A");
  const sheet = first(await db.selectFrom("load_sheet").select("id").where("site_id", "=", site.id).executeTakeFirst(), "load sheet");
  const plan = first(await db.selectFrom("kit_plan").select(["id", "latest_revision"]).where("team_id", "=", teamA.id).executeTakeFirst(), "plan");
  const supplier = first(await db.selectFrom("supplier").select("id").where("team_id", "=", teamA.id).executeTakeFirst(), "supplier");
  const offer = first(await db.selectFrom("offer").select("id").where("team_id", "=", teamA.id).executeTakeFirst(), "offer");
  const rate = first(await db.selectFrom("exchange_rate").select("id").where("team_id", "=", teamA.id).executeTakeFirst(), "exchange rate");
  const quotes = await db.selectFrom("quote").select(["id", "status", "customer_user_id"]).where("team_id", "=", teamA.id).execute();
  const sentQuote = first(
    quotes.find((q) => q.status === "sent" && q.customer_user_id),
    "sent quote",
  );
  const draftQuote = first(
    quotes.find((q) => q.status === "draft"),
    "draft quote",
  );
  const reading = (teamId: string) =>
    db.selectFrom("field_reading").select(["id", "photo_id", "module_id"]).where("team_id", "=", teamId).where("photo_id", "is not", null).executeTakeFirst();
  const readingA = first(await reading(teamA.id), "reading of team A");
  const readingB = first(await reading(teamB.id), "reading of team B");
  const tobin = await db.selectFrom("member").innerJoin("user", "user.id", "member.userId").select("member.id").where("user.email", "=", DEMO_EMAILS.member!);
  const memberA = first(await tobin.executeTakeFirst(), "member of team A");
  const part = (table: "pv_module" | "charge_controller" | "battery" | "inverter") => db.selectFrom(table).select("id").executeTakeFirstOrThrow();
  const pick = {
    moduleId: (await part("pv_module")).id,
    controllerId: (await part("charge_controller")).id,
    batteryId: (await part("battery")).id,
    inverterId: (await part("inverter")).id,
    modulesInSeries: "2",
    stringsInParallel: "1",
    batteryStrings: "1",
  };

  // Team A's private names: nobody outside team A may ever read these.
  const names = { site: canary("Site"), sheet: canary("Sheet"), plan: canary("Plan"), supplier: canary("Supplier"), offer: canary("Offer") };
  const quoteTitles = { sent: canary("SentQuote"), draft: canary("DraftQuote") };
  await db.updateTable("site").set({ name: names.site, customer_name: names.site }).where("team_id", "=", teamA.id).execute();
  await db.updateTable("load_sheet").set({ name: names.sheet }).where("team_id", "=", teamA.id).execute();
  await db.updateTable("kit_plan").set({ name: names.plan }).where("team_id", "=", teamA.id).execute();
  await db
    .updateTable("supplier")
    .set({ name: sql<string>`name || ${` ${names.supplier}`}::text` })
    .where("team_id", "=", teamA.id)
    .execute();
  await db.updateTable("offer").set({ notes: names.offer }).where("team_id", "=", teamA.id).execute();
  await db.updateTable("quote").set({ title: quoteTitles.draft }).where("id", "=", draftQuote.id).execute();
  await db.updateTable("quote").set({ title: quoteTitles.sent }).where("id", "=", sentQuote.id).execute();
  // The e-mail link of the sent quote, so that its token is known to the test.
  const quoteToken = randomBytes(32).toString("base64url");
  const tokenHash = createHash("sha256").update(quoteToken).digest("hex");
  await db.updateTable("quote").set({ access_token_hash: tokenHash }).where("id", "=", sentQuote.id).execute();

  const cookies: Record<Actor, string> = { anonymous: "" } as Record<Actor, string>;
  for (const [actor, email] of Object.entries(DEMO_EMAILS)) cookies[actor as Actor] = await signIn(port, email);
  const customer = await signUp(port, "other-customer");
  await db.updateTable("user").set({ role: "customer" }).where("email", "=", customer.email).execute();
  cookies.customer = customer.cookie;
  const noTeam = await signUp(port, "no-team");
  cookies.noTeam = noTeam.cookie;
  const emails = { ...DEMO_EMAILS, customer: customer.email, noTeam: noTeam.email } as Record<Exclude<Actor, "anonymous">, string>;

  const apiKeys = { teamA: await createApiKey(port, cookies.owner), teamB: await createApiKey(port, cookies.otherTeam) };
  const keyA = await db.selectFrom("team_api_key").select("id").where("team_id", "=", teamA.id).executeTakeFirstOrThrow();

  // Team B gets a site of its own (a copy of A's figures under a canary name), for the other direction.
  const siteForm = JSON.parse((await call(port, PUBLIC_HOST, `/api/v1/sites/${site.id}`, { headers: { Cookie: cookies.owner } })).body);
  const teamBSiteName = canary("TeamBSite");
  const created = await call(port, PUBLIC_HOST, "/api/v1/sites", {
    json: {
      ...siteForm,
      id: undefined,
      createdAt: undefined,
      updatedAt: undefined,
      name: teamBSiteName,
      customerName: teamBSiteName,
      customerEmail: undefined,
      customerPhone: undefined,
    },
    headers: { Origin: PUBLIC_URL, Cookie: cookies.otherTeam },
  });
  expect(created.status, created.body.slice(0, 300)).toBe(201);

  return {
    teamA,
    teamB,
    ids: {
      site: site.id,
      sheet: sheet.id,
      plan: plan.id,
      planRevision: plan.latest_revision,
      supplier: supplier.id,
      offer: offer.id,
      rate: rate.id,
      sentQuote: sentQuote.id,
      draftQuote: draftQuote.id,
      readingA: readingA.id,
      photoA: readingA.photo_id!,
      moduleWithReadings: readingA.module_id,
      readingB: readingB.id,
      photoB: readingB.photo_id!,
      memberA: memberA.id,
      apiKeyA: keyA.id,
      teamBSite: (JSON.parse(created.body) as { id: string }).id,
    },
    pick,
    quoteToken,
    cookies,
    emails,
    apiKeys,
    canaries: { teamAPrivate: Object.values(names).concat(quoteTitles.draft), sentQuoteTitle: quoteTitles.sent, teamBSite: teamBSiteName },
  };
}

export type World = Awaited<ReturnType<typeof buildWorld>>;
