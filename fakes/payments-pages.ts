// GET/POST /pay/:id — the browser side of checkout: show the card form, take the test card,
// then send the customer back to the app's success_url like Stripe's hosted page does.
import type { ServerResponse } from "node:http";
import { escapeHtml, renderCheckoutPage, type PageState } from "./checkout-page.ts";
import { payCheckoutSession, successRedirect } from "./checkout-payment.ts";
import { redirect, sendHtml } from "./http-helpers.ts";
import { findSession, type PaymentsContext, type SessionRecord } from "./payments-state.ts";
import type { Params } from "./stripe-params.ts";

export function showCheckoutPage(ctx: PaymentsContext, res: ServerResponse, id: string): void {
  const record = findSession(ctx.state, id);
  if (!record) return notFound(res, id);
  sendHtml(res, 200, renderCheckoutPage(record));
}

export async function submitCheckoutPage(ctx: PaymentsContext, res: ServerResponse, id: string, input: Params): Promise<void> {
  const record = findSession(ctx.state, id);
  if (!record) return notFound(res, id);
  const values = {
    card: field(input, "card"),
    expiry: field(input, "expiry"),
    cvc: field(input, "cvc"),
    name: field(input, "name"),
  };
  // Keep what was typed except the CVC, as card forms usually do.
  const retry = (status: number, kind: "error" | "info", text: string) =>
    sendHtml(res, status, renderCheckoutPage(record, { message: { kind, text }, values: { ...values, cvc: "" } }));

  const problem = formProblem(values);
  if (problem) return retry(400, "error", problem);

  const result = await payCheckoutSession(ctx.state, ctx.webhooks, record, {
    number: values.card,
    name: values.name,
  });
  if (result.outcome === "succeeded") return redirect(res, successRedirect(result.session));
  if (result.outcome === "declined") return retry(402, "error", result.message);
  rejectedPage(res, record, result.message, values);
}

function rejectedPage(res: ServerResponse, record: SessionRecord, text: string, values: PageState["values"]): void {
  // A closed session renders without the form; an unknown card keeps the form to try again.
  const kind = record.session.status === "open" ? "error" : "info";
  sendHtml(res, 400, renderCheckoutPage(record, { message: { kind, text }, values: { ...values, cvc: "" } }));
}

function formProblem(values: { card: string; expiry: string; cvc: string; name: string }): string | null {
  if (!values.card) return "Enter the card number.";
  if (!expiryInFuture(values.expiry)) return "The expiry date is incomplete or in the past (use MM/YY).";
  if (!/^\d{3,4}$/.test(values.cvc)) return "The security code (CVC) is incomplete.";
  if (!values.name) return "Enter the name on the card.";
  return null;
}

function expiryInFuture(expiry: string): boolean {
  const match = /^(\d{1,2})\s*\/\s*(\d{2}|\d{4})$/.exec(expiry);
  if (!match) return false;
  const month = Number(match[1]);
  const year = match[2]!.length === 2 ? 2000 + Number(match[2]) : Number(match[2]);
  if (month < 1 || month > 12) return false;
  const now = new Date();
  // A card is valid through the last day of its expiry month.
  return year > now.getFullYear() || (year === now.getFullYear() && month >= now.getMonth() + 1);
}

function field(input: Params, name: string): string {
  const value = input[name];
  return typeof value === "string" ? value.trim() : "";
}

function notFound(res: ServerResponse, id: string): void {
  sendHtml(
    res,
    404,
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Payment not found</title></head>` +
      `<body style="font-family:system-ui,sans-serif;padding:2rem"><p><strong>Test payment page — local fake, no real money</strong></p>` +
      `<p>No payment ${escapeHtml(id)} here. The fake keeps sessions in memory, so a restart forgets them.</p></body></html>`,
  );
}
