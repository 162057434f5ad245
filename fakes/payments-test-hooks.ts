// /_fake/* endpoints: not part of Stripe's API. They let API and e2e tests pay without a
// browser and see exactly which webhooks the app was sent and what it answered.
import { payCheckoutSession } from "./checkout-payment.ts";
import { noSuch, StripeFakeError } from "./stripe-errors.ts";
import { createPaymentsState, findSession, type PaymentsContext } from "./payments-state.ts";
import type { ApiCall } from "./payments-api.ts";

/** POST /_fake/sessions/:id/pay with `card` (and optional `name`), form or JSON. */
export async function payViaTestHook(ctx: PaymentsContext, { params, input }: ApiCall): Promise<unknown> {
  const record = findSession(ctx.state, params.id!);
  if (!record) throw noSuch("checkout.session", params.id!, "session");
  const card = typeof input.card === "string" ? input.card : "";
  const name = typeof input.name === "string" ? input.name : "Test Customer";
  const result = await payCheckoutSession(ctx.state, ctx.webhooks, record, { number: card, name });
  if (result.outcome === "rejected") throw new StripeFakeError(400, result.message, { param: "card" });
  const delivery = ctx.state.deliveries.findLast((d) => d.eventId === result.event.id) ?? null;
  return { ...result, delivery };
}

/** GET /_fake/deliveries, newest first; `?event=evt_…` narrows to one event's attempts. */
export function listDeliveries(ctx: PaymentsContext, { input }: ApiCall): unknown {
  const data = ctx.state.deliveries.filter((d) => typeof input.event !== "string" || d.eventId === input.event).reverse();
  return { object: "list", data };
}

/** POST /_fake/reset: forget everything, so one test's sessions never leak into the next. */
export function resetState(ctx: PaymentsContext): unknown {
  ctx.webhooks.cancelRetries();
  Object.assign(ctx.state, createPaymentsState());
  return { reset: true };
}
