// A quote being saved when PostgreSQL stops is either fully saved or not at all: thirty saves of the
// demo draft quote are under way when the database is stopped (fast shutdown ends open transactions);
// every answer is a redirect (saved) or a 503 (not saved), and afterwards the quote's one revision
// has exactly the lines of one save, with totals that are those lines' totals.
import { afterAll, beforeAll, expect, it } from "vitest";
import { call } from "./helpers/http";
import { openDatabase, seedDemo, signIn } from "./helpers/access-world";
import { PUBLIC_HOST, PUBLIC_URL, startThrowawayStack } from "./helpers/throwaway-stack";
import { moneyText } from "~/domain/money/money";
import { priceEnteredLines } from "~/domain/quotes/quote-lines";

let stack: Awaited<ReturnType<typeof startThrowawayStack>>;
let db: ReturnType<typeof openDatabase>;

beforeAll(async () => {
  stack = await startThrowawayStack(1);
  seedDemo(stack.databaseUrl);
  db = openDatabase(stack.databaseUrl);
}, 180_000);

afterAll(async () => {
  await db?.destroy();
  await stack?.stop();
});

/** The editor's form for the draft, with `extraLines` freight lines so each save is recognisable. */
function saveForm(base: { title: string; customer_name: string; customer_email: string }, extraLines: number): Record<string, string> {
  const form: Record<string, string> = {
    intent: "save",
    title: base.title,
    customerName: base.customer_name || "Brackwater growers",
    customerEmail: base.customer_email || "growers@brackwater.example",
    marginPct: "20",
    discountPct: "0",
    taxRatePct: "20",
    depositPct: "30",
    validUntil: "2099-01-31",
    terms: "Outage test",
  };
  const lines = [{ kind: "labour", description: "Labour", quantity: "8", unitCost: "45.00" }];
  for (let i = 0; i < extraLines; i++) lines.push({ kind: "freight", description: `Freight leg ${i + 1}`, quantity: "1", unitCost: `${10 + i}.00` });
  lines.forEach((line, i) => Object.entries(line).forEach(([k, v]) => (form[`lines[${i}].${k}`] = v)));
  return form;
}

it("saves a quote whole or not at all when the database stops mid-save", async () => {
  const port = stack.instances[0].port;
  const cookie = await signIn(port, "maren@tallowmere.example");
  const draft = await db.selectFrom("quote").selectAll().where("status", "=", "draft").executeTakeFirstOrThrow();
  const path = `/quotes/${draft.id}`;
  const save = (n: number) => call(port, PUBLIC_HOST, path, { form: saveForm(draft, n), headers: { Origin: PUBLIC_URL, Cookie: cookie }, timeoutMs: 15_000 });

  // Saves start 10 ms apart; the database stops as soon as the first one has been answered, so the
  // rest are queued, mid-transaction or not yet started.
  const saves = Array.from({ length: 30 }, (_, i) => new Promise((r) => setTimeout(r, i * 10)).then(() => save((i % 5) + 1)));
  await saves[0];
  stack.stopDatabase();
  const answers = await Promise.all(saves).catch((error) => {
    throw new Error(`${error.message}; the server said: ${stack.instances[0].output.slice(-15).join("\n")}`);
  });
  const statuses = answers.map((a) => a.status);
  expect(
    statuses.every((s) => s === 302 || s === 503),
    `statuses: ${statuses.join(",")}`,
  ).toBe(true);
  expect(statuses).toContain(503);
  console.log(`quote saves during the outage: ${statuses.filter((s) => s === 302).length} saved, ${statuses.filter((s) => s === 503).length} refused with 503`);

  stack.startDatabase();
  for (let i = 0; i < 50; i++) {
    if ((await call(port, PUBLIC_HOST, "/readyz")).status === 200) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  const revisions = await db.selectFrom("quote_revision").selectAll().where("quote_id", "=", draft.id).execute();
  expect(revisions).toHaveLength(1);
  const rev = revisions[0];
  const lines = await db.selectFrom("quote_line").selectAll().where("revision_id", "=", rev.id).orderBy("position").execute();
  // Either one save's lines (labour, then freight legs 1…n) or, if none got through, the seeded draft.
  if (rev.terms === "Outage test") {
    expect(lines.map((l) => l.description)).toEqual(["Labour", ...lines.slice(1).map((_, k) => `Freight leg ${k + 1}`)]);
  } else {
    expect(statuses).not.toContain(302);
  }
  const totals = priceEnteredLines(
    lines.map((l) => ({
      kind: l.kind,
      description: l.description,
      quantity: l.quantity,
      unitCost: l.unit_cost,
      marginPct: l.margin_pct,
      discountPct: l.discount_pct,
      taxRatePct: l.tax_rate_pct,
      partKind: l.part_kind,
      partId: l.part_id,
      offerId: l.offer_id,
    })),
    { marginPct: rev.margin_pct, discountPct: rev.discount_pct, taxRatePct: rev.tax_rate_pct },
    draft.currency,
    rev.deposit_pct,
  );
  expect([rev.net, rev.gross, rev.deposit]).toEqual([moneyText(totals.net), moneyText(totals.gross), moneyText(totals.deposit)]);
  const orphans = await db
    .selectFrom("quote_line")
    .leftJoin("quote_revision", "quote_revision.id", "quote_line.revision_id")
    .select("quote_line.id")
    .where("quote_revision.id", "is", null)
    .execute();
  expect(orphans).toEqual([]);

  // And the app saves again by itself once the database is back.
  expect((await save(2)).status).toBe(302);
  const after = await db
    .selectFrom("quote_line")
    .innerJoin("quote_revision", "quote_revision.id", "quote_line.revision_id")
    .select("quote_line.description")
    .where("quote_revision.quote_id", "=", draft.id)
    .execute();
  expect(after.map((l) => l.description).sort()).toEqual(["Freight leg 1", "Freight leg 2", "Labour"]);
}, 120_000);
