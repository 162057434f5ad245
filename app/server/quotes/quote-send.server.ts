// Sending a quote to its customer (first time or again) and withdrawing it. The e-mail goes out inside
// the transaction: if it cannot be sent, the quote stays as it was and the installer is told.
import Decimal from "decimal.js";
import { db } from "../db.server";
import { env } from "../env.server";
import { sendMail } from "../mail.server";
import { changeQuoteStatus, type QuoteActor } from "./quote-events.server";
import { ensureCustomerAccount, newAccessToken } from "./customer-account.server";
import { quoteWithTeam } from "./quote-queries.server";
import { formatMoney, money } from "~/domain/money/money";
import { effectiveStatus, formatQuoteNumber, STATUS_LABELS, teamCanSend, teamCanWithdraw } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";

export type SendOutcome = { ok: true; resent: boolean; revision: number } | { ok: false; status: number; message: string };

function refuse(message: string, status = 409): SendOutcome {
  return { ok: false, status, message };
}

export async function sendQuote(teamId: string, actor: QuoteActor, quoteId: string): Promise<SendOutcome | null> {
  const pre = await db
    .selectFrom("quote")
    .select(["customer_email", "customer_name"])
    .where("team_id", "=", teamId)
    .where("id", "=", quoteId)
    .executeTakeFirst();
  if (!pre) return null;
  if (!pre.customer_email || !pre.customer_name) return refuse("Enter the customer's name and e-mail address, save, then send.", 400);
  // Outside the transaction: better-auth writes through its own connection. Reusing is idempotent.
  const account = await ensureCustomerAccount(pre.customer_email, pre.customer_name);
  try {
    return await db.transaction().execute(async (trx) => {
      const quote = await quoteWithTeam(trx).where("quote.team_id", "=", teamId).where("quote.id", "=", quoteId).forUpdate("quote").executeTakeFirstOrThrow();
      const rev = await trx
        .selectFrom("quote_revision")
        .select(["id", "revision", "sent_at", "gross", "deposit", "deposit_pct", (eb) => eb.cast<string>("valid_until", "text").as("valid_until")])
        .where("quote_id", "=", quote.id)
        .where("revision", "=", quote.latest_revision)
        .executeTakeFirstOrThrow();
      const today = todayIso();
      const status = effectiveStatus(quote.status, rev.valid_until, today);
      if (!teamCanSend(quote.status)) return refuse(`This quote is ${STATUS_LABELS[quote.status].toLowerCase()}: it cannot be sent again.`);
      if (rev.valid_until < today) return refuse(`Revision ${rev.revision} was valid until ${rev.valid_until}: set a later date, save, then send.`);
      const unpriced = await trx.selectFrom("quote_line").select("position").where("revision_id", "=", rev.id).where("unit_cost", "=", "0").execute();
      if (unpriced.length)
        return refuse(
          `Line${unpriced.length > 1 ? "s" : ""} ${unpriced.map((l) => l.position).join(", ")} ha${unpriced.length > 1 ? "ve" : "s"} no cost yet: enter it or remove the line before sending.`,
          400,
        );

      const resent = rev.sent_at !== null && quote.sent_revision === rev.revision && status !== "withdrawn";
      const { token, hash } = newAccessToken();
      if (rev.sent_at === null) await trx.updateTable("quote_revision").set({ sent_at: new Date() }).where("id", "=", rev.id).execute();
      await trx
        .updateTable("quote")
        .set({
          sent_revision: rev.revision,
          customer_user_id: account.userId,
          access_token_hash: hash,
          decided_at: null,
          decided_name: null,
          decision_comment: null,
        })
        .where("id", "=", quote.id)
        .execute();
      const number = formatQuoteNumber(quote.number);
      await changeQuoteStatus(trx, "sent", {
        quoteId: quote.id,
        revision: rev.revision,
        kind: resent ? "resent" : "sent",
        actor,
        detail: `${resent ? "Sent again" : `Revision ${rev.revision} sent`} to ${quote.customer_name} <${quote.customer_email}>.`,
      });
      await sendMail({
        to: quote.customer_email,
        subject: `${quote.team_name} sent you quote ${number}: ${quote.title}`,
        paragraphs: [
          `Hello ${quote.customer_name},`,
          `${quote.team_name} has prepared a quote for your off-grid solar kit: ${quote.title}.`,
          `Total ${formatMoney(money(rev.gross, quote.currency))}, with a deposit of ${formatMoney(money(rev.deposit, quote.currency))} (${new Decimal(rev.deposit_pct).toString()} %) when you approve. The quote is valid until ${rev.valid_until}.`,
          account.created
            ? "Open the quote with the button below. On your first visit you choose a password, so that only you can read and approve it."
            : "Open the quote with the button below and sign in with your Kitwright account.",
        ],
        action: { label: `Read quote ${number}`, url: `${env.PUBLIC_URL}/quote-access/${token}` },
      });
      return { ok: true as const, resent, revision: rev.revision };
    });
  } catch (error) {
    if (isMailError(error))
      return refuse("The e-mail could not be sent (the mail server did not accept it), so the quote was not sent. Try again in a moment.", 503);
    throw error;
  }
}

function isMailError(error: unknown) {
  const e = error as { code?: string; command?: string; responseCode?: number };
  return typeof e?.code === "string" && (e.code.startsWith("E") || e.command !== undefined || e.responseCode !== undefined) && !("severity" in (e as object));
}

export async function withdrawQuote(teamId: string, actor: QuoteActor, quoteId: string, reason: string): Promise<SendOutcome | null> {
  return db.transaction().execute(async (trx) => {
    const quote = await quoteWithTeam(trx).where("quote.team_id", "=", teamId).where("quote.id", "=", quoteId).forUpdate("quote").executeTakeFirst();
    if (!quote) return null;
    if (!teamCanWithdraw(quote.status)) return refuse(`This quote is ${STATUS_LABELS[quote.status].toLowerCase()}: only a sent quote can be withdrawn.`);
    await trx.updateTable("quote").set({ access_token_hash: null }).where("id", "=", quote.id).execute();
    await changeQuoteStatus(trx, "withdrawn", { quoteId: quote.id, revision: quote.sent_revision, kind: "withdrawn", actor, detail: reason });
    await sendMail({
      to: quote.customer_email,
      subject: `Quote ${formatQuoteNumber(quote.number)} from ${quote.team_name} was withdrawn`,
      paragraphs: [
        `Hello ${quote.customer_name},`,
        `${quote.team_name} has withdrawn the quote "${quote.title}".${reason ? ` Their note: ${reason}` : ""}`,
        "You do not need to do anything. If you expected a new quote, they will send it to you.",
      ],
    });
    return { ok: true as const, resent: false, revision: quote.sent_revision ?? quote.latest_revision };
  });
}
