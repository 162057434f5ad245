// The customer's account: created (role customer, no password yet) or reused when a quote is first
// sent to an address; the link in the e-mail lets a new customer choose their first password.
import { createHash, randomBytes } from "node:crypto";
import { auth } from "../auth.server";
import { db } from "../db.server";
import { ROLES } from "~/lib/roles";

export function newAccessToken() {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashAccessToken(token) };
}

export function hashAccessToken(token: string) {
  return createHash("sha256").update(token).digest("hex");
}

export async function hasPassword(userId: string) {
  const row = await db.selectFrom("account").select("id").where("userId", "=", userId).where("providerId", "=", "credential").executeTakeFirst();
  return row !== undefined;
}

/** Finds the account for this address or creates a customer account without a password. */
export async function ensureCustomerAccount(email: string, name: string): Promise<{ userId: string; created: boolean }> {
  const ctx = await auth.$context;
  const existing = await ctx.internalAdapter.findUserByEmail(email.toLowerCase());
  if (existing) return { userId: existing.user.id, created: false };
  const user = await ctx.internalAdapter.createUser(
    { email: email.toLowerCase(), name, emailVerified: false, role: ROLES.customer },
    { method: "quote-invitation" },
  );
  return { userId: user.id, created: true };
}

/**
 * First visit from the e-mail: the token proves the customer reads that mailbox, so they may set the
 * account's first password (never replace an existing one: that is the reset-password flow).
 */
export async function setFirstPassword(userId: string, password: string): Promise<boolean> {
  if (await hasPassword(userId)) return false;
  const ctx = await auth.$context;
  const hash = await ctx.password.hash(password);
  await ctx.internalAdapter.linkAccount({ userId, providerId: "credential", accountId: userId, password: hash });
  await ctx.internalAdapter.updateUser(userId, { emailVerified: true });
  return true;
}
