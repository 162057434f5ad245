// What the customer does with a quote sent to them: open it (recorded once per sent revision),
// approve it with their typed name, or decline it with a comment. The team hears of each decision.
import { sql } from "kysely";
import { db } from "../db.server";
import { env } from "../env.server";
import { sendMail } from "../mail.server";
import { changeQuoteStatus, type Executor, type QuoteActor } from "./quote-events.server";
import { customerCanDecide, effectiveStatus, formatQuoteNumber, STATUS_LABELS } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";

export type DecisionOutcome = { ok: true } | { ok: false; status: number; message: string };

function lockCustomerQuote(trx: Executor, userId: string, quoteId: string) {
  return trx
    .selectFrom("quote")
    .innerJoin("quote_revision", (j) => j.onRef("quote_revision.quote_id", "=", "quote.id").onRef("quote_revision.revision", "=", "quote.sent_revision"))
    .select(["quote.id", "quote.status", "quote.sent_revision", "quote.number", "quote.title", "quote.team_id", "quote.created_by", "quote.customer_name"])
    .select(sql<string>`quote_revision.valid_until::text`.as("valid_until"))
    .where("quote.customer_user_id", "=", userId)
    .where("quote.id", "=", quoteId)
    .where("quote.status", "not in", ["draft", "withdrawn"])
    .forUpdate("quote")
    .executeTakeFirst();
}

/** The first time the customer opens a sent revision, the team sees "opened". */
export async function recordViewed(userId: string, actor: QuoteActor, quoteId: string) {
  await db.transaction().execute(async (trx) => {
    const quote = await lockCustomerQuote(trx, userId, quoteId);
    if (!quote || quote.status !== "sent") return;
    await changeQuoteStatus(trx, "viewed", {
      quoteId,
      revision: quote.sent_revision,
      kind: "viewed",
      actor,
      detail: `Revision ${quote.sent_revision} opened.`,
    });
  });
}

/** Records an expired quote's expiry once, so the timeline says when it ran out. */
export async function recordExpiryIfDue(trx: Executor, quote: { id: string; status: string; sent_revision: number | null; valid_until: string }) {
  if (quote.status !== "sent" && quote.status !== "viewed") return false;
  if (effectiveStatus(quote.status, quote.valid_until, todayIso()) !== "expired") return false;
  await changeQuoteStatus(trx, "expired", {
    quoteId: quote.id,
    revision: quote.sent_revision,
    kind: "expired",
    actor: { userId: null, name: "Kitwright" },
    detail: `Valid until ${quote.valid_until}.`,
  });
  return true;
}

export async function decideQuote(
  userId: string,
  actor: QuoteActor,
  quoteId: string,
  decision: { approve: true; acceptedName: string } | { approve: false; comment: string },
): Promise<DecisionOutcome | null> {
  const outcome = await db.transaction().execute(async (trx) => {
    const quote = await lockCustomerQuote(trx, userId, quoteId);
    if (!quote) return null;
    if (await recordExpiryIfDue(trx, quote))
      return { ok: false as const, status: 409, message: `This quote was valid until ${quote.valid_until}. Ask the installer for a new one.`, quote };
    if (!customerCanDecide(quote.status))
      return { ok: false as const, status: 409, message: `This quote is already ${STATUS_LABELS[quote.status].toLowerCase()}.`, quote };
    const now = new Date();
    if (decision.approve) {
      await trx.updateTable("quote").set({ decided_at: now, decided_name: decision.acceptedName, decision_comment: null }).where("id", "=", quote.id).execute();
      await changeQuoteStatus(trx, "approved", {
        quoteId,
        revision: quote.sent_revision,
        kind: "approved",
        actor,
        detail: `Approved as "${decision.acceptedName}".`,
      });
    } else {
      await trx.updateTable("quote").set({ decided_at: now, decided_name: null, decision_comment: decision.comment }).where("id", "=", quote.id).execute();
      await changeQuoteStatus(trx, "declined", { quoteId, revision: quote.sent_revision, kind: "declined", actor, detail: decision.comment });
    }
    return { ok: true as const, quote };
  });
  if (!outcome) return null;
  if (outcome.ok)
    await tellTeam(outcome.quote, decision).catch((error) =>
      console.error(JSON.stringify({ level: "error", msg: "decision mail failed", error: String(error) })),
    );
  return outcome.ok ? { ok: true } : { ok: false, status: outcome.status, message: outcome.message };
}

async function tellTeam(
  quote: { id: string; number: number; title: string; team_id: string; created_by: string | null; customer_name: string },
  decision: { approve: boolean; acceptedName?: string; comment?: string },
) {
  const recipients = await db
    .selectFrom("member")
    .innerJoin("user", "user.id", "member.userId")
    .select("user.email")
    .where("member.organizationId", "=", quote.team_id)
    .where((eb) => eb.or([eb("member.role", "=", "owner"), ...(quote.created_by ? [eb("member.userId", "=", quote.created_by)] : [])]))
    .execute();
  const number = formatQuoteNumber(quote.number);
  const said = decision.approve
    ? `approved it as "${decision.acceptedName}". They can now pay the deposit.`
    : `declined it. Their comment: ${decision.comment}`;
  for (const r of new Set(recipients.map((x) => x.email))) {
    await sendMail({
      to: r,
      subject: `${quote.customer_name} ${decision.approve ? "approved" : "declined"} quote ${number}`,
      paragraphs: [`${quote.customer_name} read quote ${number} (${quote.title}) and ${said}`],
      action: { label: `Open quote ${number}`, url: `${env.PUBLIC_URL}/quotes/${quote.id}` },
    });
  }
}

/** Called when a quote is read: records the expiry of its sent revision once it is past. */
export async function noteExpiry(quoteId: string) {
  return db.transaction().execute(async (trx) => {
    const quote = await trx
      .selectFrom("quote")
      .innerJoin("quote_revision", (j) => j.onRef("quote_revision.quote_id", "=", "quote.id").onRef("quote_revision.revision", "=", "quote.sent_revision"))
      .select(["quote.id", "quote.status", "quote.sent_revision"])
      .select(sql<string>`quote_revision.valid_until::text`.as("valid_until"))
      .where("quote.id", "=", quoteId)
      .where("quote.status", "in", ["sent", "viewed"])
      .forUpdate("quote")
      .executeTakeFirst();
    return quote ? recordExpiryIfDue(trx, quote) : false;
  });
}
