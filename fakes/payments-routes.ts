// Route table of the payments fake. "api" routes return a JSON body (or throw a Stripe-style
// error); "page" routes write their own HTML response.
import type { ServerResponse } from "node:http";
import {
  createCheckoutSession,
  expireCheckoutSession,
  listCheckoutSessions,
  listEvents,
  listSessionLineItems,
  retrieveCheckoutSession,
  retrieveEvent,
  retrievePaymentIntent,
  type ApiHandler,
} from "./payments-api.ts";
import { showCheckoutPage, submitCheckoutPage } from "./payments-pages.ts";
import type { PaymentsContext } from "./payments-state.ts";
import { listDeliveries, payViaTestHook, resetState } from "./payments-test-hooks.ts";
import type { Params } from "./stripe-params.ts";

export type PageHandler = (ctx: PaymentsContext, res: ServerResponse, params: Record<string, string>, input: Params) => void | Promise<void>;

export type Route =
  { method: "GET" | "POST"; path: string; kind: "api"; handle: ApiHandler } | { method: "GET" | "POST"; path: string; kind: "page"; handle: PageHandler };

export const ROUTES: Route[] = [
  { method: "POST", path: "/v1/checkout/sessions", kind: "api", handle: createCheckoutSession },
  { method: "GET", path: "/v1/checkout/sessions", kind: "api", handle: listCheckoutSessions },
  { method: "GET", path: "/v1/checkout/sessions/:id", kind: "api", handle: retrieveCheckoutSession },
  { method: "POST", path: "/v1/checkout/sessions/:id/expire", kind: "api", handle: expireCheckoutSession },
  { method: "GET", path: "/v1/checkout/sessions/:id/line_items", kind: "api", handle: listSessionLineItems },
  { method: "GET", path: "/v1/payment_intents/:id", kind: "api", handle: retrievePaymentIntent },
  { method: "GET", path: "/v1/events", kind: "api", handle: listEvents },
  { method: "GET", path: "/v1/events/:id", kind: "api", handle: retrieveEvent },
  {
    method: "GET",
    path: "/pay/:id",
    kind: "page",
    handle: (ctx, res, params) => showCheckoutPage(ctx, res, params.id!),
  },
  {
    method: "POST",
    path: "/pay/:id",
    kind: "page",
    handle: (ctx, res, params, input) => submitCheckoutPage(ctx, res, params.id!, input),
  },
  // Polled by scripts/lib/services.ts before the app starts.
  { method: "GET", path: "/healthz", kind: "api", handle: () => ({ ok: true }) },
  { method: "POST", path: "/_fake/sessions/:id/pay", kind: "api", handle: payViaTestHook },
  { method: "GET", path: "/_fake/deliveries", kind: "api", handle: listDeliveries },
  { method: "POST", path: "/_fake/reset", kind: "api", handle: resetState },
];
