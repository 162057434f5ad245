// Limits on guessing passwords and on flooding inboxes with reset links, by account (the e-mail
// typed, whether or not it has an account, so the answer reveals nothing) and by client address.
// A sign-in that succeeds does not count: it clears the account's failures and refunds the address's
// attempt, so only failures add up. Checked by the sign-in and forgot-password pages and by
// better-auth's own endpoints (app/routes/api.auth.$.ts).
import { attemptBucket, clearAttempts, consumeAttempt, refundAttempt, type AttemptRule } from "./attempt-limits.server";
import { clientIp } from "./client-ip.server";

export const SIGN_IN_LIMITS = {
  perAccount: { max: 5, windowSeconds: 15 * 60 },
  perIp: { max: 30, windowSeconds: 15 * 60 },
} satisfies Record<string, AttemptRule>;

export const PASSWORD_RESET_LIMITS = {
  perAccount: { max: 3, windowSeconds: 60 * 60 },
  perIp: { max: 10, windowSeconds: 60 * 60 },
} satisfies Record<string, AttemptRule>;

export type AttemptGate = { allowed: true; succeeded: () => Promise<void> } | { allowed: false; retryAfterSeconds: number; message: string };

type Scope = "sign-in" | "password-reset";

export function gateSignIn(request: Request, email: string) {
  return gate("sign-in", SIGN_IN_LIMITS, request, email);
}

export function gatePasswordReset(request: Request, email: string) {
  return gate("password-reset", PASSWORD_RESET_LIMITS, request, email);
}

async function gate(scope: Scope, limits: typeof SIGN_IN_LIMITS, request: Request, email: string): Promise<AttemptGate> {
  const account = attemptBucket(scope, "account", email.trim().toLowerCase());
  const ip = clientIp(request);
  const address = ip ? attemptBucket(scope, "ip", ip) : null;
  const byAccount = await consumeAttempt(account, limits.perAccount);
  if (!byAccount.allowed) return refused(scope, byAccount.retryAfterSeconds);
  if (address) {
    const byAddress = await consumeAttempt(address, limits.perIp);
    if (!byAddress.allowed) {
      await refundAttempt(account);
      return refused(scope, byAddress.retryAfterSeconds);
    }
  }
  async function succeeded() {
    await clearAttempts(account);
    if (address) await refundAttempt(address);
  }
  return { allowed: true, succeeded };
}

function refused(scope: Scope, retryAfterSeconds: number): AttemptGate {
  return { allowed: false, retryAfterSeconds, message: tooManyAttemptsMessage(scope, retryAfterSeconds) };
}

export function tooManyAttemptsMessage(scope: Scope, retryAfterSeconds: number) {
  const minutes = Math.max(1, Math.ceil(retryAfterSeconds / 60));
  const what = scope === "sign-in" ? "sign-in attempts" : "password reset requests";
  return `Too many ${what}; try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`;
}
