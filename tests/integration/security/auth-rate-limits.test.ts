// Sign-in and password-reset limits, per account and per client address, counted in PostgreSQL.
import { describe, expect, it, vi } from "vitest";
import { callAction, formPost, jsonPost, pageError } from "./attempt-helpers";
import { PASSWORD, signUpUser } from "../helpers/fixtures";
import { uniqueEmail } from "../helpers/route-client";
import * as signIn from "~/routes/sign-in";
import * as forgotPassword from "~/routes/forgot-password";
import * as authApi from "~/routes/api.auth.$";
import { PASSWORD_RESET_LIMITS, SIGN_IN_LIMITS } from "~/server/auth-attempts.server";
import { pool } from "~/server/db.server";
import { listOutbox } from "~/server/outbox.server";

const ACCOUNT_MAX = SIGN_IN_LIMITS.perAccount.max;

function wrongSignIn(email: string, ip: string | null = null, action = signIn.action) {
  return callAction(action, formPost("/sign-in", { email, password: "not-the-password" }, ip));
}

function expectRetryAfter(result: { headers: Headers }, windowSeconds: number) {
  const retryAfter = Number(result.headers.get("Retry-After"));
  expect(retryAfter).toBeGreaterThan(0);
  expect(retryAfter).toBeLessThanOrEqual(windowSeconds);
  return retryAfter;
}

describe("sign-in attempts per account", () => {
  it(`answers 429 with a retry time after ${ACCOUNT_MAX} failures, even to the right password`, async () => {
    const { email } = await signUpUser("limit-account");
    for (let i = 0; i < ACCOUNT_MAX; i++) expect((await wrongSignIn(email)).status).toBe(401);
    const refused = await callAction(signIn.action, formPost("/sign-in", { email, password: PASSWORD }));
    expect(refused.status).toBe(429);
    expectRetryAfter(refused, SIGN_IN_LIMITS.perAccount.windowSeconds);
    expect(pageError(refused)).toBe("Too many sign-in attempts; try again in 15 minutes.");
    expect(refused.headers.getSetCookie()).toHaveLength(0);
  });

  it("counts only failures: a successful sign-in clears them", async () => {
    const { email } = await signUpUser("limit-success");
    for (let i = 0; i < ACCOUNT_MAX - 1; i++) expect((await wrongSignIn(email)).status).toBe(401);
    expect((await callAction(signIn.action, formPost("/sign-in", { email, password: PASSWORD }))).status).toBe(302);
    for (let i = 0; i < ACCOUNT_MAX; i++) expect((await wrongSignIn(email)).status).toBe(401);
    expect((await wrongSignIn(email)).status).toBe(429);
  });

  it("still limits the account when every attempt comes from another address", async () => {
    const { email } = await signUpUser("limit-rotating");
    for (let i = 0; i < ACCOUNT_MAX; i++) expect((await wrongSignIn(email, `198.51.100.${i + 1}`)).status).toBe(401);
    const refused = await wrongSignIn(email, "203.0.113.200");
    expect(refused.status).toBe(429);
    expectRetryAfter(refused, SIGN_IN_LIMITS.perAccount.windowSeconds);
  });

  it("counts the JSON endpoint and the page together", async () => {
    const { email } = await signUpUser("limit-api");
    const half = Math.floor(ACCOUNT_MAX / 2);
    for (let i = 0; i < half; i++) expect((await wrongSignIn(email)).status).toBe(401);
    for (let i = half; i < ACCOUNT_MAX; i++) {
      expect((await callAction(authApi.action, jsonPost("/api/auth/sign-in/email", { email, password: "not-the-password" }))).status).toBe(401);
    }
    const refused = await callAction(authApi.action, jsonPost("/api/auth/sign-in/email", { email, password: PASSWORD }));
    expect(refused.status).toBe(429);
    expect(refused.data).toMatchObject({ code: "TOO_MANY_ATTEMPTS", message: expect.stringMatching(/try again in 15 minutes/) });
    expectRetryAfter(refused, SIGN_IN_LIMITS.perAccount.windowSeconds);
  });
});

describe("sign-in attempts per client address", () => {
  it("limits one address trying many accounts, and not another address", async () => {
    const ip = "192.0.2.77";
    for (let i = 0; i < SIGN_IN_LIMITS.perIp.max; i++) expect((await wrongSignIn(uniqueEmail("spray"), ip)).status).toBe(401);
    const refused = await wrongSignIn(uniqueEmail("spray"), ip);
    expect(refused.status).toBe(429);
    expectRetryAfter(refused, SIGN_IN_LIMITS.perIp.windowSeconds);
    // The same address in its IPv4-mapped IPv6 form is the same client.
    expect((await wrongSignIn(uniqueEmail("spray"), `::ffff:${ip}`)).status).toBe(429);
    expect((await wrongSignIn(uniqueEmail("spray"), "192.0.2.78")).status).toBe(401);
  });
});

describe("limits shared by every instance", () => {
  it("counts attempts made through two separately loaded apps that share only the database", async () => {
    const { email } = await signUpUser("limit-instances");
    vi.resetModules();
    const second = await import("~/routes/sign-in");
    const secondDb = await import("~/server/db.server");
    try {
      // A second module graph: its own pg pool and its own better-auth instance.
      expect(second.action).not.toBe(signIn.action);
      expect(secondDb.pool).not.toBe(pool);
      for (let i = 0; i < ACCOUNT_MAX; i++) {
        const action = i % 2 === 0 ? signIn.action : second.action;
        expect((await wrongSignIn(email, null, action)).status).toBe(401);
      }
      expect((await wrongSignIn(email, null, second.action)).status).toBe(429);
      expect((await wrongSignIn(email, null, signIn.action)).status).toBe(429);
    } finally {
      await secondDb.pool.end();
    }
  });
});

describe("password reset requests", () => {
  async function requestReset(email: string) {
    return callAction(forgotPassword.action, formPost("/forgot-password", { email }));
  }

  it("sends a few links per account, then answers 429 and sends no more", async () => {
    const { email } = await signUpUser("limit-reset");
    for (let i = 0; i < PASSWORD_RESET_LIMITS.perAccount.max; i++) expect((await requestReset(email)).status).toBe(302);
    const refused = await requestReset(email);
    expect(refused.status).toBe(429);
    expect(pageError(refused)).toBe("Too many password reset requests; try again in 60 minutes.");
    expectRetryAfter(refused, PASSWORD_RESET_LIMITS.perAccount.windowSeconds);
    await new Promise((r) => setTimeout(r, 500));
    expect(await listOutbox(email)).toHaveLength(PASSWORD_RESET_LIMITS.perAccount.max);
  });

  it("answers an address without an account the same way, so the limit reveals nothing", async () => {
    const email = uniqueEmail("no-account");
    for (let i = 0; i < PASSWORD_RESET_LIMITS.perAccount.max; i++) expect((await requestReset(email)).status).toBe(302);
    expect((await requestReset(email)).status).toBe(429);
  });

  it("limits better-auth's reset endpoint with the same count", async () => {
    const { email } = await signUpUser("limit-reset-api");
    for (let i = 0; i < PASSWORD_RESET_LIMITS.perAccount.max; i++) {
      expect((await callAction(authApi.action, jsonPost("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" }))).status).toBe(200);
    }
    const refused = await requestReset(email);
    expect(refused.status).toBe(429);
  });
});
