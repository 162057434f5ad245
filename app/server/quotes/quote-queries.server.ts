// Reading quotes: the team's list and one quote with a revision, its lines, timeline and payments.
// Every query filters by the acting team (or, for customers, by the customer's own account) in SQL.
import { sql } from "kysely";
import { db } from "../db.server";
import { isUuid } from "../modules.server";
import type { Executor } from "./quote-events.server";
import type { QuoteStatus } from "~/domain/quotes/quote-status";

/** A quote row with its team's name (the name heads every document and e-mail about it). */
export function quoteWithTeam(ex: Executor = db) {
  return ex.selectFrom("quote").innerJoin("organization", "organization.id", "quote.team_id").selectAll("quote").select("organization.name as team_name");
}

const revisionColumns = [
  "quote_revision.id",
  "quote_revision.revision",
  "quote_revision.plan_revision",
  "quote_revision.margin_pct",
  "quote_revision.discount_pct",
  "quote_revision.tax_rate_pct",
  "quote_revision.deposit_pct",
  sql<string>`quote_revision.valid_until::text`.as("valid_until"),
  "quote_revision.terms",
  "quote_revision.net",
  "quote_revision.tax",
  "quote_revision.gross",
  "quote_revision.deposit",
  "quote_revision.tax_bands",
  "quote_revision.plan_snapshot",
  "quote_revision.note",
  "quote_revision.sent_at",
  "quote_revision.created_at",
] as const;

export interface QuoteListFilter {
  status?: QuoteStatus | "open";
  search?: string;
}

export async function listTeamQuotes(teamId: string, filter: QuoteListFilter = {}) {
  let q = db
    .selectFrom("quote")
    .innerJoin("quote_revision", (j) => j.onRef("quote_revision.quote_id", "=", "quote.id").onRef("quote_revision.revision", "=", "quote.latest_revision"))
    .innerJoin("kit_plan", "kit_plan.id", "quote.plan_id")
    .select([
      "quote.id",
      "quote.number",
      "quote.title",
      "quote.customer_name",
      "quote.customer_email",
      "quote.status",
      "quote.currency",
      "quote.latest_revision",
      "quote.sent_revision",
      "quote.updated_at",
      "quote_revision.gross",
      "quote_revision.deposit",
      sql<string>`quote_revision.valid_until::text`.as("valid_until"),
      "kit_plan.name as plan_name",
    ])
    .where("quote.team_id", "=", teamId);
  if (filter.status === "open") q = q.where("quote.status", "in", ["draft", "sent", "viewed", "approved"]);
  else if (filter.status === "expired")
    q = q.where("quote.status", "in", ["sent", "viewed", "expired"]).where("quote_revision.valid_until", "<", sql<string>`current_date`);
  else if (filter.status) q = q.where("quote.status", "=", filter.status);
  const search = filter.search?.trim();
  if (search) {
    const like = `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    q = q.where((eb) => eb.or([eb("quote.title", "ilike", like), eb("quote.customer_name", "ilike", like), eb("quote.customer_email", "ilike", like)]));
  }
  return q.orderBy("quote.updated_at", "desc").limit(500).execute();
}

export async function findRevision(quoteId: string, revision: number) {
  const rev = await db.selectFrom("quote_revision").select(revisionColumns).where("quote_id", "=", quoteId).where("revision", "=", revision).executeTakeFirst();
  if (!rev) return undefined;
  const lines = await db.selectFrom("quote_line").selectAll().where("revision_id", "=", rev.id).orderBy("position").execute();
  return { ...rev, lines };
}

export type QuoteRevisionDetail = NonNullable<Awaited<ReturnType<typeof findRevision>>>;

async function timelineAndPayments(quoteId: string) {
  const [events, payments, revisions] = await Promise.all([
    db.selectFrom("quote_event").selectAll().where("quote_id", "=", quoteId).orderBy("at").orderBy("id").execute(),
    db.selectFrom("quote_payment").selectAll().where("quote_id", "=", quoteId).orderBy("created_at").execute(),
    db
      .selectFrom("quote_revision")
      .select(["revision", "sent_at", "created_at", "note", "gross"])
      .where("quote_id", "=", quoteId)
      .orderBy("revision", "desc")
      .execute(),
  ]);
  return { events, payments, revisions };
}

/** One of the team's quotes at a revision (the latest by default). */
export async function findTeamQuote(teamId: string, quoteId: string, revision?: number) {
  if (!isUuid(quoteId)) return undefined;
  const quote = await quoteWithTeam().where("quote.team_id", "=", teamId).where("quote.id", "=", quoteId).executeTakeFirst();
  if (!quote) return undefined;
  const rev = await findRevision(quote.id, revision ?? quote.latest_revision);
  if (!rev) return undefined;
  return { quote, revision: rev, ...(await timelineAndPayments(quote.id)) };
}

export type TeamQuoteDetail = NonNullable<Awaited<ReturnType<typeof findTeamQuote>>>;

/** A quote sent to this customer account, at the revision they were last sent. */
export async function findCustomerQuote(userId: string, quoteId: string) {
  if (!isUuid(quoteId)) return undefined;
  const quote = await quoteWithTeam()
    .where("quote.customer_user_id", "=", userId)
    .where("quote.id", "=", quoteId)
    .where("quote.sent_revision", "is not", null)
    .where("quote.status", "not in", ["draft", "withdrawn"])
    .executeTakeFirst();
  if (!quote || quote.sent_revision === null) return undefined;
  const rev = await findRevision(quote.id, quote.sent_revision);
  if (!rev) return undefined;
  const payments = await db.selectFrom("quote_payment").selectAll().where("quote_id", "=", quote.id).orderBy("created_at").execute();
  return { quote, revision: rev, payments };
}

export type CustomerQuoteDetail = NonNullable<Awaited<ReturnType<typeof findCustomerQuote>>>;

export function listCustomerQuotes(userId: string) {
  return db
    .selectFrom("quote")
    .innerJoin("organization", "organization.id", "quote.team_id")
    .innerJoin("quote_revision", (j) => j.onRef("quote_revision.quote_id", "=", "quote.id").onRef("quote_revision.revision", "=", "quote.sent_revision"))
    .select([
      "quote.id",
      "quote.number",
      "quote.title",
      "quote.status",
      "quote.currency",
      "quote.updated_at",
      "organization.name as team_name",
      "quote_revision.gross",
      "quote_revision.deposit",
      sql<string>`quote_revision.valid_until::text`.as("valid_until"),
    ])
    .where("quote.customer_user_id", "=", userId)
    .where("quote.status", "not in", ["draft", "withdrawn"])
    .orderBy("quote.updated_at", "desc")
    .execute();
}
