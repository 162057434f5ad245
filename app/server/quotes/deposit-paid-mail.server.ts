// After a deposit is recorded: a receipt to the customer and a notice to the team (the quote's author
// and the team's owners). Each message is sent on its own, so one bad address never stops the rest.
import Decimal from "decimal.js";
import { formatMoney, money } from "~/domain/money/money";
import { formatQuoteNumber } from "~/domain/quotes/quote-status";
import { db } from "../db.server";
import { env } from "../env.server";
import { sendMail, type MailMessage } from "../mail.server";
import { errorText, logPayments } from "../payments/payments-log.server";

const DATE = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeZone: "UTC" });

export async function sendDepositPaidMails(paymentId: string) {
  const row = await db
    .selectFrom("quote_payment as p")
    .innerJoin("quote as q", "q.id", "p.quote_id")
    .innerJoin("quote_revision as r", (join) => join.onRef("r.quote_id", "=", "p.quote_id").onRef("r.revision", "=", "p.revision"))
    .innerJoin("organization as team", "team.id", "q.team_id")
    .leftJoin("user as customer", "customer.id", "q.customer_user_id")
    .select([
      "p.quote_id",
      "p.amount",
      "p.currency",
      "p.paid_at",
      "q.number",
      "q.title",
      "q.team_id",
      "q.created_by",
      "q.customer_name",
      "q.customer_email",
      "r.gross",
    ])
    .select(["team.name as teamName", "customer.email as accountEmail"])
    .where("p.id", "=", paymentId)
    .executeTakeFirstOrThrow();

  const paid = money(row.amount, row.currency);
  const gross = money(row.gross, row.currency);
  const balance = money(new Decimal(row.gross).minus(row.amount), row.currency);
  const number = formatQuoteNumber(row.number);
  const date = DATE.format(row.paid_at ? new Date(row.paid_at) : new Date());
  const figures = `Quote total ${formatMoney(gross)}; deposit paid ${formatMoney(paid)}; balance remaining ${formatMoney(balance)}.`;

  const messages: MailMessage[] = [
    {
      to: row.accountEmail ?? row.customer_email,
      subject: `Deposit received for quote ${number}`,
      paragraphs: [
        `Hello ${row.customer_name},`,
        `${row.teamName} has received your deposit of ${formatMoney(paid)} for quote ${number} (${row.title}), paid by card on ${date}.`,
        figures,
        "Please keep this e-mail as your receipt for the deposit.",
      ],
      action: { label: "View your quote", url: new URL(`/my-quotes/${row.quote_id}`, env.PUBLIC_URL).toString() },
    },
    ...(await teamAddresses(row.team_id, row.created_by)).map((to) => ({
      to,
      subject: `Deposit paid on ${number} by ${row.customer_name}`,
      paragraphs: [`${row.customer_name} paid the deposit of ${formatMoney(paid)} on quote ${number} (${row.title}) on ${date}.`, figures],
      action: { label: "Open the quote", url: new URL(`/quotes/${row.quote_id}`, env.PUBLIC_URL).toString() },
    })),
  ];
  for (const message of messages) {
    try {
      await sendMail(message);
    } catch (error) {
      logPayments("error", "deposit mail failed", { paymentId, subject: message.subject, error: errorText(error) });
    }
  }
}

/** The quote's author (if still on the team) and the team's owners, each once. */
async function teamAddresses(teamId: string, createdBy: string | null) {
  const rows = await db
    .selectFrom("member")
    .innerJoin("user", "user.id", "member.userId")
    .select("user.email")
    .where("member.organizationId", "=", teamId)
    .where((eb) => (createdBy ? eb.or([eb("member.role", "=", "owner"), eb("member.userId", "=", createdBy)]) : eb("member.role", "=", "owner")))
    .execute();
  return [...new Set(rows.map((r) => r.email))];
}
