// better-auth's own endpoints (/api/auth/*). The app's pages use them through server-side actions.
// Sign-in and password-reset requests pass the same attempt limits as the pages, so the JSON
// endpoints are no way around them.
import type { Route } from "./+types/api.auth.$";
import { auth } from "~/server/auth.server";
import { gatePasswordReset, gateSignIn } from "~/server/auth-attempts.server";

const LIMITED: Record<string, typeof gateSignIn | undefined> = {
  "/api/auth/sign-in/email": gateSignIn,
  "/api/auth/request-password-reset": gatePasswordReset,
};

export async function loader({ request }: Route.LoaderArgs) {
  return auth.handler(request);
}

export async function action({ request }: Route.ActionArgs) {
  const gateFor = LIMITED[new URL(request.url).pathname];
  const email = gateFor ? await emailInBody(request) : null;
  // Without an e-mail better-auth answers 400 itself.
  if (!gateFor || !email) return auth.handler(request);
  const gate = await gateFor(request, email);
  if (!gate.allowed) {
    return Response.json(
      { code: "TOO_MANY_ATTEMPTS", message: gate.message },
      { status: 429, headers: { "Retry-After": String(gate.retryAfterSeconds), "Cache-Control": "no-store" } },
    );
  }
  const response = await auth.handler(request);
  if (response.ok && gateFor === gateSignIn) await gate.succeeded();
  return response;
}

async function emailInBody(request: Request): Promise<string | null> {
  try {
    const body: unknown = await request.clone().json();
    const email = typeof body === "object" && body !== null ? (body as { email?: unknown }).email : null;
    return typeof email === "string" && email.trim() ? email : null;
  } catch {
    return null;
  }
}
