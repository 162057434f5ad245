// The team's quoting currency and its own dated exchange rates.
import Decimal from "decimal.js";
import { sql } from "kysely";
import type { Executor } from "./executor.server";
import type { ExchangeRate } from "~/domain/money/currency-conversion";
import type { TeamPricing } from "~/domain/sourcing/offer-costing";
import { todayIso } from "~/domain/sourcing/offer-validity";

/** Until a team chooses, amounts are compared in euros (the demo valley's currency). */
export const DEFAULT_QUOTING_CURRENCY = "EUR";

export async function getQuotingCurrency(db: Executor, teamId: string) {
  const row = await db.selectFrom("team_sourcing_settings").select("quoting_currency").where("team_id", "=", teamId).executeTakeFirst();
  return { currency: row?.quoting_currency ?? DEFAULT_QUOTING_CURRENCY, chosen: Boolean(row) };
}

export async function setQuotingCurrency(db: Executor, teamId: string, currency: string) {
  await db
    .insertInto("team_sourcing_settings")
    .values({ team_id: teamId, quoting_currency: currency })
    .onConflict((oc) => oc.column("team_id").doUpdateSet({ quoting_currency: currency, updated_at: new Date() }))
    .execute();
}

export interface RateRow {
  id: string;
  from: string;
  to: string;
  rate: string;
  asOf: string;
}

export async function listRates(db: Executor, teamId: string): Promise<RateRow[]> {
  return db
    .selectFrom("exchange_rate")
    .select(["id", "from_currency as from", "to_currency as to", "rate", sql<string>`as_of::text`.as("asOf")])
    .where("team_id", "=", teamId)
    .orderBy("from_currency")
    .orderBy("to_currency")
    .orderBy("as_of", "desc")
    .execute();
}

/** A rate for a pair on a day replaces an earlier entry for the same pair and day. */
export async function saveRate(
  db: Executor,
  teamId: string,
  userId: string | null,
  rate: { fromCurrency: string; toCurrency: string; rate: string; asOf: string },
) {
  await db
    .insertInto("exchange_rate")
    .values({ team_id: teamId, from_currency: rate.fromCurrency, to_currency: rate.toCurrency, rate: rate.rate, as_of: rate.asOf, created_by: userId })
    .onConflict((oc) =>
      oc.columns(["team_id", "from_currency", "to_currency", "as_of"]).doUpdateSet({ rate: rate.rate, created_by: userId, created_at: new Date() }),
    )
    .execute();
}

export async function deleteRate(db: Executor, teamId: string, rateId: string) {
  const result = await db.deleteFrom("exchange_rate").where("team_id", "=", teamId).where("id", "=", rateId).executeTakeFirst();
  return Number(result.numDeletedRows) > 0;
}

export function toExchangeRates(rows: readonly RateRow[]): ExchangeRate[] {
  return rows.map((r) => ({ from: r.from, to: r.to, rate: new Decimal(r.rate), asOf: r.asOf }));
}

/** Everything a comparison needs to put offers in the team's currency on a given day. */
export async function loadTeamPricing(db: Executor, teamId: string, asOf: string = todayIso()): Promise<TeamPricing> {
  const [{ currency }, rates] = await Promise.all([getQuotingCurrency(db, teamId), listRates(db, teamId)]);
  return { quotingCurrency: currency, rates: toExchangeRates(rates), asOf };
}
