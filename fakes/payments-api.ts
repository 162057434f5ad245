// The /v1 endpoints the app (through the Stripe SDK) and tests call. Each handler returns the
// JSON body or throws a StripeFakeError; the server turns either into a response.
import { createSessionRecord, expandSession, lineItemList } from "./checkout-sessions.ts";
import { noSuch, StripeFakeError, invalidParam } from "./stripe-errors.ts";
import type { Params } from "./stripe-params.ts";
import { findSession, recordEvent, type PaymentsContext, type SessionRecord } from "./payments-state.ts";

export type ApiCall = { params: Record<string, string>; input: Params };
export type ApiHandler = (ctx: PaymentsContext, call: ApiCall) => unknown;

export function createCheckoutSession(ctx: PaymentsContext, { input }: ApiCall): unknown {
  const record = createSessionRecord(input, ctx.baseUrl, ctx.log);
  ctx.state.sessions.set(record.session.id, record);
  return expandSession(record, input.expand, (id) => ctx.state.paymentIntents.get(id));
}

export function retrieveCheckoutSession(ctx: PaymentsContext, { params, input }: ApiCall): unknown {
  return expandSession(sessionOr404(ctx, params.id!), input.expand, (id) => ctx.state.paymentIntents.get(id));
}

export function listCheckoutSessions(ctx: PaymentsContext, { input }: ApiCall): unknown {
  const records = [...ctx.state.sessions.values()]
    .map((r) => findSession(ctx.state, r.session.id)!.session)
    .filter((s) => !input.payment_intent || s.payment_intent === input.payment_intent)
    .filter((s) => !input.status || s.status === input.status)
    .reverse();
  return paginate(records, input, "/v1/checkout/sessions");
}

export async function expireCheckoutSession(ctx: PaymentsContext, { params }: ApiCall): Promise<unknown> {
  const record = sessionOr404(ctx, params.id!);
  if (record.session.status !== "open") {
    throw new StripeFakeError(
      400,
      `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${record.session.status}".`,
    );
  }
  record.session.status = "expired";
  record.session.url = null;
  await ctx.webhooks.deliver(recordEvent(ctx.state, "checkout.session.expired", record.session));
  return record.session;
}

export function listSessionLineItems(ctx: PaymentsContext, { params }: ApiCall): unknown {
  const record = sessionOr404(ctx, params.id!);
  return lineItemList(record.session.id, record.lineItems);
}

export function retrievePaymentIntent(ctx: PaymentsContext, { params }: ApiCall): unknown {
  const intent = ctx.state.paymentIntents.get(params.id!);
  if (!intent) throw noSuch("payment_intent", params.id!);
  return intent;
}

export function listEvents(ctx: PaymentsContext, { input }: ApiCall): unknown {
  const type = typeof input.type === "string" ? input.type : undefined;
  // Stripe allows one trailing wildcard: type=checkout.session.*
  const matches = (eventType: string) => !type || (type.endsWith(".*") ? eventType.startsWith(type.slice(0, -1)) : eventType === type);
  const events = ctx.state.events.filter((e) => matches(e.type)).reverse();
  return paginate(events, input, "/v1/events");
}

export function retrieveEvent(ctx: PaymentsContext, { params }: ApiCall): unknown {
  const event = ctx.state.events.find((e) => e.id === params.id);
  if (!event) throw noSuch("event", params.id!);
  return event;
}

function sessionOr404(ctx: PaymentsContext, id: string): SessionRecord {
  const record = findSession(ctx.state, id);
  if (!record) throw noSuch("checkout.session", id, "session");
  return record;
}

/** Stripe's cursor pagination over a newest-first list. */
function paginate<T extends { id: string }>(items: T[], input: Params, url: string) {
  const limit = input.limit === undefined ? 10 : Number(input.limit);
  if (!Number.isInteger(limit) || limit < 1 || limit > 100) {
    throw invalidParam("limit", "limit must be an integer between 1 and 100.");
  }
  if (typeof input.ending_before === "string") {
    // Paging backwards: has_more says whether newer items remain beyond this page.
    const end = cursorIndex(items, input.ending_before, "ending_before");
    const start = Math.max(0, end - limit);
    return { object: "list", data: items.slice(start, end), has_more: start > 0, url };
  }
  const start = typeof input.starting_after === "string" ? cursorIndex(items, input.starting_after, "starting_after") + 1 : 0;
  const data = items.slice(start, start + limit);
  return { object: "list", data, has_more: start + limit < items.length, url };
}

function cursorIndex(items: { id: string }[], id: string, param: string): number {
  const index = items.findIndex((item) => item.id === id);
  if (index === -1) throw noSuch("object", id, param);
  return index;
}
