// Deleting a site takes its load sheets and saved kit plans with it (the schema cascades), but a plan
// that a quote was priced from must stay (quote.plan_id restricts): such a site is refused, naming
// the quotes, rather than failing in the database.
import type { Transaction } from "kysely";
import { db } from "./db.server";
import type { Database } from "./db-schema";
import { isUuid } from "./modules.server";
import { formatQuoteNumber } from "~/domain/quotes/quote-status";
import type { SiteDependents } from "~/lib/site-dependents";

export type SiteDeleteOutcome =
  { ok: true; removed: SiteDependents } | { ok: false; reason: "not-found" } | { ok: false; reason: "quoted"; quoteNumbers: string[] };

export async function siteDependents(executor: Transaction<Database> | typeof db, teamId: string, siteId: string): Promise<SiteDependents> {
  const count = (table: "kit_plan" | "load_sheet") =>
    executor
      .selectFrom(table)
      .select((eb) => eb.fn.countAll<string>().as("n"))
      .where("team_id", "=", teamId)
      .where("site_id", "=", siteId)
      .executeTakeFirst();
  // One after another: inside a transaction they share one connection anyway.
  const plans = await count("kit_plan");
  const sheets = await count("load_sheet");
  const quotes = await executor
    .selectFrom("quote")
    .innerJoin("kit_plan", "kit_plan.id", "quote.plan_id")
    .select("quote.number")
    .where("kit_plan.site_id", "=", siteId)
    .where("quote.team_id", "=", teamId)
    .orderBy("quote.number")
    .execute();
  return { planCount: Number(plans?.n ?? 0), loadSheetCount: Number(sheets?.n ?? 0), quoteNumbers: quotes.map((q) => formatQuoteNumber(q.number)) };
}

/**
 * Locks the site row (no plan can be added meanwhile: its foreign key waits on the lock) and the site's
 * plan rows (no quote can be priced from them meanwhile), then checks for quotes and deletes.
 */
export async function deleteSiteUnlessQuoted(teamId: string, siteId: string): Promise<SiteDeleteOutcome> {
  if (!isUuid(siteId)) return { ok: false, reason: "not-found" };
  return db.transaction().execute(async (trx) => {
    const site = await trx.selectFrom("site").select("id").where("team_id", "=", teamId).where("id", "=", siteId).forUpdate().executeTakeFirst();
    if (!site) return { ok: false, reason: "not-found" } as const;
    await trx.selectFrom("kit_plan").select("id").where("site_id", "=", siteId).forUpdate().execute();
    const dependents = await siteDependents(trx, teamId, siteId);
    if (dependents.quoteNumbers.length) return { ok: false, reason: "quoted", quoteNumbers: dependents.quoteNumbers } as const;
    await trx.deleteFrom("site").where("team_id", "=", teamId).where("id", "=", siteId).execute();
    return { ok: true, removed: dependents } as const;
  });
}
