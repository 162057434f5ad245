// Cross-site request forgery, refused at the door: a state-changing request must come from a page
// of our own origin (PUBLIC_URL). Browsers send Origin with every cross-origin POST, PUT, PATCH and
// DELETE, and with same-origin ones too; Referer is the fallback for the rare request without it.
// Used by the production server (scripts/lib/request-guards.ts) on every request, before routing.

const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** Signed by the payment provider (Stripe-Signature) and posted from its servers: no Origin at all. */
export const CROSS_ORIGIN_EXEMPT_PATHS: ReadonlySet<string> = new Set(["/api/v1/payments/webhook"]);

export interface IncomingWrite {
  method: string;
  path: string;
  origin?: string | null;
  referer?: string | null;
  authorization?: string | null;
}

/** Why the request is refused, or null when it may pass. */
export function crossOriginRefusal(request: IncomingWrite, publicUrl: string): string | null {
  if (!STATE_CHANGING.has(request.method.toUpperCase())) return null;
  if (CROSS_ORIGIN_EXEMPT_PATHS.has(request.path)) return null;
  // An API key in Authorization authenticates by itself, with no cookie a browser adds on its own;
  // and no other site can make a browser send that header (it needs a CORS preflight we never grant).
  if (request.authorization && /^Bearer\s+\S/i.test(request.authorization)) return null;
  const expected = new URL(publicUrl).origin;
  const origin = request.origin ? request.origin : originOf(request.referer);
  if (!origin) return "The request carries neither Origin nor Referer.";
  if (origin !== expected) return `Requests from ${origin} may not change anything here.`;
  return null;
}

function originOf(url: string | null | undefined): string | null {
  if (!url) return null;
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}
