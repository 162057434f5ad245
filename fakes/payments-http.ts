// Request handling for the payments fake: API-key check, body parsing, idempotent replays
// and error mapping. Any failure becomes a Stripe-style JSON error, never a crash.
import type { IncomingMessage, ServerResponse } from "node:http";
import { BodyTooLargeError, matchPath, readBody, sendJson } from "./http-helpers.ts";
import { ROUTES } from "./payments-routes.ts";
import { newId, type PaymentsContext } from "./payments-state.ts";
import { sendStripeError, StripeFakeError } from "./stripe-errors.ts";
import { parseBody, parseStripeForm, ParamsError, type Params } from "./stripe-params.ts";

export async function handlePaymentsRequest(ctx: PaymentsContext, req: IncomingMessage, res: ServerResponse): Promise<void> {
  const method = req.method ?? "GET";
  const url = new URL(req.url ?? "/", "http://localhost");
  res.setHeader("Request-Id", newId("req_", 14));
  try {
    if (url.pathname.startsWith("/v1/")) checkApiKey(req.headers.authorization);
    const match = findRoute(method, url.pathname);
    if (!match) {
      req.resume();
      throw new StripeFakeError(404, `Unrecognized request URL (${method}: ${url.pathname}).`);
    }
    const input = await readInput(req, method, url);
    const { route, params } = match;
    if (route.kind === "page") return await route.handle(ctx, res, params, input);

    const idempotencyKey = method === "POST" ? req.headers["idempotency-key"] : undefined;
    const replay = typeof idempotencyKey === "string" ? ctx.state.idempotent.get(idempotencyKey) : undefined;
    if (replay) return sendJson(res, replay.status, replay.body, { "Idempotent-Replayed": "true" });
    const body = await route.handle(ctx, { params, input });
    if (typeof idempotencyKey === "string") ctx.state.idempotent.set(idempotencyKey, { status: 200, body });
    sendJson(res, 200, body);
  } catch (error) {
    if (res.headersSent) return void res.end();
    sendStripeError(res, toStripeError(error, ctx));
  }
}

function findRoute(method: string, pathname: string) {
  for (const route of ROUTES) {
    if (route.method !== method) continue;
    const params = matchPath(route.path, pathname);
    if (params) return { route, params };
  }
  return null;
}

async function readInput(req: IncomingMessage, method: string, url: URL): Promise<Params> {
  // Stripe takes GET parameters (expand, limit, …) in the query string and POST ones in the body.
  if (method === "GET") {
    req.resume();
    return parseStripeForm(url.searchParams);
  }
  return parseBody(await readBody(req), req.headers["content-type"]);
}

function checkApiKey(authorization: string | undefined): void {
  const key = apiKeyFrom(authorization);
  if (!key) {
    throw new StripeFakeError(401, "You did not provide an API key. Send it in the Authorization header as 'Bearer sk_test_…'.");
  }
  if (!key.startsWith("sk_test_")) {
    // Masked like Stripe does, so logs never carry a whole key.
    const masked = `${key.slice(0, 8)}****${key.slice(-4)}`;
    throw new StripeFakeError(401, `Invalid API Key provided: ${masked}. The payments fake accepts secret test keys (sk_test_…) only.`);
  }
}

function apiKeyFrom(authorization: string | undefined): string | null {
  if (!authorization) return null;
  const [scheme, value = ""] = authorization.trim().split(/\s+/, 2);
  if (scheme?.toLowerCase() === "bearer") return value || null;
  // `curl -u sk_test_…:` sends the key as the Basic-auth user name, which Stripe also accepts.
  if (scheme?.toLowerCase() === "basic") {
    return Buffer.from(value, "base64").toString("utf8").split(":")[0] || null;
  }
  return null;
}

function toStripeError(error: unknown, ctx: PaymentsContext): StripeFakeError {
  if (error instanceof StripeFakeError) return error;
  if (error instanceof ParamsError) return new StripeFakeError(400, error.message);
  if (error instanceof BodyTooLargeError) return new StripeFakeError(413, error.message);
  ctx.log(`payments fake: unexpected error: ${(error as Error)?.stack ?? String(error)}`);
  return new StripeFakeError(500, "The payments fake hit an unexpected error; see its log.");
}
