// The world the hostile-input test attacks: one production server on a throwaway PostgreSQL with
// the demo people, catalogue, readings, sourcing and plans (hostile-seed-script.ts), a mail sink so
// quotes can be sent, signed-in sessions for every role, a team API key, and two quotes drafted
// through the pages (one sent to a customer who has chosen a password, one left as a draft).
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { DEMO_PASSWORD } from "../../../data/demo/people";
import { withField, type Actor, type SeededIds } from "./hostile-corpus";
import { CUSTOMER_EMAIL, quoteEditorFields, SECOND_CUSTOMER_EMAIL } from "./hostile-corpus-quotes";
import { siteFormFields } from "./hostile-corpus-planning";
import { cookieOf, send, urlEncoded, type FormFields, type RawAnswer } from "./hostile-http";
import { XSS_ATTRIBUTE, XSS_SCRIPT } from "./hostile-values";
import { startMailSink } from "./mail-sink";
import { openDatabase } from "./row-counts";
import { PUBLIC_URL, startThrowawayStack } from "./throwaway-stack";

export type HostileWorld = Awaited<ReturnType<typeof startHostileWorld>>;

export async function startHostileWorld() {
  const mail = await startMailSink();
  // Payments point at a closed port: no case here may reach the card provider.
  const stack = await startThrowawayStack(1, { env: { SMTP_HOST: "127.0.0.1", SMTP_PORT: String(mail.port), STRIPE_API_URL: "http://127.0.0.1:9" } });
  const port = stack.instances[0].port;
  const seed = spawnSync("node_modules/.bin/tsx", ["tests/production/helpers/hostile-seed-script.ts"], {
    env: { ...process.env, DATABASE_URL: stack.databaseUrl },
    encoding: "utf8",
  });
  if (seed.status !== 0) throw new Error(`seeding failed: ${seed.stderr}`);
  const database = await openDatabase(stack.databaseUrl);

  const postForm = (path: string, fields: FormFields, cookie = "") =>
    send(port, {
      method: "POST",
      path,
      body: urlEncoded(fields),
      headers: { "Content-Type": "application/x-www-form-urlencoded", Origin: PUBLIC_URL, Cookie: cookie },
    });
  const expectRedirect = (answer: RawAnswer, what: string) => {
    if (answer.status !== 302) throw new Error(`${what}: expected a redirect, got ${answer.status}: ${answer.body.slice(0, 400)}`);
    return String(answer.headers.location);
  };
  const signIn = async (email: string) =>
    cookieOf(
      await postForm("/sign-in", [
        ["email", email],
        ["password", DEMO_PASSWORD],
      ]),
    );

  const cookies: Record<Actor, string> = {
    installer: await signIn("maren@tallowmere.example"),
    curator: await signIn("curator@kitwright.example"),
    admin: await signIn("admin@kitwright.example"),
    loner: cookieOf(
      await postForm("/sign-up", [
        ["name", "Lone Installer"],
        ["email", "loner@test.example"],
        ["password", "long-enough-password"],
      ]),
    ),
    customer: "",
    anonymous: "",
    apiKey: "",
  };
  const otherOwner = await signIn("sefa@brindlecombe.example");
  const keyPage = await postForm(
    "/team/api-keys",
    [
      ["intent", "create"],
      ["name", "Hostile key"],
    ],
    cookies.installer,
  );
  const apiKey = /kw_[A-Za-z0-9_-]{20,}/.exec(keyPage.body)?.[0];
  if (!apiKey) throw new Error(`no API key in the answer (${keyPage.status})`);

  const one = async <T>(text: string, params: unknown[] = []) => (await database.client.query(text, params)).rows[0] as T;
  const plan = await one<{ id: string; site_id: string; load_sheet_id: string; choices: Record<string, string> }>(
    "select p.id, p.site_id, p.load_sheet_id, r.choices from kit_plan p join kit_plan_revision r on r.plan_id = p.id order by p.created_at limit 1",
  );
  const otherSite = expectRedirect(await postForm("/sites/new", siteFormFields("Other team's site"), otherOwner), "a site for the other team");

  // Quote 1: saved with markup in its title and line, then sent; quote 2 stays a draft.
  const quotePath = expectRedirect(await postForm("/quotes", [["planId", plan.id]], cookies.installer), "drafting a quote");
  const sentQuoteId = quotePath.split("/").pop()!;
  expectRedirect(await postForm(quotePath, [["intent", "save"], ...quoteEditorFields(XSS_SCRIPT, XSS_ATTRIBUTE)], cookies.installer), "saving the quote");
  expectRedirect(await postForm(quotePath, [["intent", "send"]], cookies.installer), "sending the quote");
  const draftQuoteId = expectRedirect(await postForm("/quotes", [["planId", plan.id]], cookies.installer), "a second quote")
    .split("/")
    .pop()!;
  // Quote 3 goes to a second customer who never chooses a password: its link keeps offering the
  // first-password form, which the corpus attacks. The e-mailed tokens are random; set ones we know
  // (only their hashes are stored).
  const accessPath = expectRedirect(await postForm("/quotes", [["planId", plan.id]], cookies.installer), "a third quote");
  expectRedirect(
    await postForm(accessPath, [["intent", "save"], ...withField(quoteEditorFields(), "customerEmail", SECOND_CUSTOMER_EMAIL)], cookies.installer),
    "saving quote 3",
  );
  expectRedirect(await postForm(accessPath, [["intent", "send"]], cookies.installer), "sending quote 3");
  const tokenHash = (token: string) => createHash("sha256").update(token).digest("hex");
  const quoteAccessToken = "hostile-test-access-token-0123456789";
  const customerToken = "hostile-test-customer-token-0123456789";
  await database.client.query("update quote set access_token_hash = $1 where id = $2", [tokenHash(customerToken), sentQuoteId]);
  await database.client.query("update quote set access_token_hash = $1 where id = $2", [tokenHash(quoteAccessToken), accessPath.split("/").pop()]);
  const firstPassword = await postForm(`/quote-access/${customerToken}`, [
    ["password", "customer-password-1"],
    ["confirmPassword", "customer-password-1"],
  ]);
  expectRedirect(firstPassword, "the customer's first password");
  cookies.customer = cookieOf(firstPassword);
  // The customer's first look records "viewed" (an event, by design); done here so that no hostile
  // request below is charged with it.
  const firstLook = await send(port, { method: "GET", path: `/my-quotes/${sentQuoteId}`, headers: { Cookie: cookies.customer } });
  if (firstLook.status !== 200) throw new Error(`the customer cannot open the quote: ${firstLook.status}`);

  const ids: SeededIds = {
    moduleId: plan.choices.moduleId,
    mergeDuplicateId: (await one<{ id: string }>("select id from pv_module where id <> $1 order by maker, model limit 1", [plan.choices.moduleId])).id,
    batteryId: plan.choices.batteryId,
    controllerId: plan.choices.controllerId,
    inverterId: plan.choices.inverterId,
    siteId: plan.site_id,
    loadSheetId: plan.load_sheet_id,
    planId: plan.id,
    otherTeamSiteId: otherSite.split("/").pop()!,
    supplierId: (await one<{ id: string }>("select id from supplier order by name limit 1")).id,
    offerId: (await one<{ id: string }>("select id from offer order by created_at limit 1")).id,
    readingId: (await one<{ id: string }>("select id from field_reading order by created_at limit 1")).id,
    fileId: (await one<{ id: string }>("select id from stored_file limit 1")).id,
    sentQuoteId,
    draftQuoteId,
    quoteAccessToken,
    memberId: (await one<{ id: string }>(`select m.id from member m join "user" u on u.id = m."userId" where u.email = 'tobin@tallowmere.example'`)).id,
    adminUserId: (await one<{ id: string }>(`select id from "user" where email = 'admin@kitwright.example'`)).id,
    otherUserId: (await one<{ id: string }>(`select id from "user" where email = 'tobin@tallowmere.example'`)).id,
  };
  if (!mail.mails.some((m) => m.to.includes(CUSTOMER_EMAIL))) throw new Error("the quote e-mail did not reach the mail sink");

  async function stop() {
    await database.close().catch(() => {});
    await stack.stop();
    await mail.stop();
  }
  return { stack, port, database, cookies, apiKey, ids, mail, postForm, stop };
}
