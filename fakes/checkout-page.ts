// The hosted payment page. Deliberately plain and self-contained (no assets, no scripts) and
// unmistakably a test page, so nobody mistakes it for a real checkout.
import { TEST_CARDS } from "./checkout-payment.ts";
import type { SessionRecord } from "./payments-state.ts";

export type PageState = {
  message?: { kind: "error" | "info"; text: string };
  values?: { card?: string; expiry?: string; cvc?: string; name?: string };
};

export function renderCheckoutPage(record: SessionRecord, state: PageState = {}): string {
  const { session, lineItems } = record;
  const total = formatAmount(session.amount_total, session.currency);
  const rows = lineItems
    .map(
      (item) =>
        `<tr><td>${escapeHtml(item.description)}${item.quantity > 1 ? ` × ${item.quantity}` : ""}</td>` +
        `<td class="num">${formatAmount(item.amount_total, item.currency)}</td></tr>`,
    )
    .join("");
  const values = state.values ?? {};
  const message = state.message ? `<p class="msg ${state.message.kind}" role="alert">${escapeHtml(state.message.text)}</p>` : "";
  const body =
    session.status === "open"
      ? cardForm(session.id, total, values, session.cancel_url)
      : `<p class="msg info">${session.status === "complete" ? "This payment is complete." : "This payment link has expired."}</p>`;
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Test payment — ${total}</title>
<style>
body{font:16px/1.5 system-ui,sans-serif;background:#eef0ec;color:#1d2320;margin:0;padding:2rem 1rem}
main{max-width:26rem;margin:0 auto;background:#fff;border:2px dashed #8a6d1f;border-radius:6px;padding:1.5rem}
.banner{background:#fff4d0;color:#5b4610;font-weight:600;padding:.5rem .75rem;margin:-1.5rem -1.5rem 1rem;border-bottom:2px dashed #8a6d1f}
table{width:100%;border-collapse:collapse;margin-bottom:.5rem}td{padding:.25rem 0;border-bottom:1px solid #dde1da}
.num{text-align:right}.total td{font-weight:700;border-bottom:none}
label{display:block;margin-top:.75rem;font-size:.9rem}input{box-sizing:border-box;width:100%;font:inherit;padding:.45rem;border:1px solid #9aa39a;border-radius:4px}
.pair{display:flex;gap:.75rem}.pair label{flex:1}
button{margin-top:1.25rem;width:100%;font:inherit;font-weight:600;padding:.6rem;background:#2f5d46;color:#fff;border:0;border-radius:4px;cursor:pointer}
.msg{padding:.5rem .75rem;border-radius:4px}.error{background:#fbe3e0;color:#8c1d12}.info{background:#e4eef7;color:#1b3f5e}
.hint{font-size:.85rem;color:#5a635b}.cancel{display:block;text-align:center;margin-top:.75rem;font-size:.9rem}
</style></head>
<body><main>
<div class="banner">Test payment page — local fake, no real money</div>
<h1 style="font-size:1.25rem;margin:0 0 .75rem">Pay ${total}</h1>
<table>${rows}<tr class="total"><td>Total</td><td class="num">${total}</td></tr></table>
${message}
${body}
</main></body></html>`;
}

function cardForm(id: string, total: string, values: NonNullable<PageState["values"]>, cancelUrl: string | null): string {
  const value = (v: string | undefined) => escapeHtml(v ?? "");
  return `<form method="post" action="/pay/${encodeURIComponent(id)}">
<label>Card number<input name="card" inputmode="numeric" autocomplete="cc-number" required value="${value(values.card)}" placeholder="${TEST_CARDS.succeeds}"></label>
<div class="pair"><label>Expiry (MM/YY)<input name="expiry" autocomplete="cc-exp" required value="${value(values.expiry)}" placeholder="12/34"></label>
<label>CVC<input name="cvc" inputmode="numeric" autocomplete="cc-csc" required value="${value(values.cvc)}" placeholder="123"></label></div>
<label>Name on card<input name="name" autocomplete="cc-name" required value="${value(values.name)}"></label>
<button type="submit">Pay ${total}</button>
</form>
<p class="hint">Test cards: ${TEST_CARDS.succeeds} pays; ${TEST_CARDS.declined} is declined. Any future expiry, any 3-digit CVC.</p>
${cancelUrl ? `<a class="cancel" href="${escapeHtml(cancelUrl)}">Cancel and go back</a>` : ""}`;
}

export function formatAmount(minorUnits: number, currency: string): string {
  const upper = currency.toUpperCase();
  try {
    const format = new Intl.NumberFormat("en", { style: "currency", currency: upper });
    // Stripe amounts are in the currency's minor unit (cents; yen have none).
    const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
    return format.format(minorUnits / 10 ** digits);
  } catch {
    return `${(minorUnits / 100).toFixed(2)} ${upper}`;
  }
}

export function escapeHtml(text: string): string {
  return text.replaceAll("&", "&amp;").replaceAll("<", "&lt;").replaceAll(">", "&gt;").replaceAll('"', "&quot;").replaceAll("'", "&#39;");
}
