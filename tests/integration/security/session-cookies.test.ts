// The session cookie cannot be read by scripts, is not sent with cross-site posts or sub-requests,
// and travels only over TLS when the app is served over https.
import { afterEach, describe, expect, it, vi } from "vitest";
import { RouteClient, uniqueEmail } from "../helpers/route-client";
import { PASSWORD } from "../helpers/fixtures";
import * as signUp from "~/routes/sign-up";

function sessionCookie(headers: Headers) {
  const line = headers.getSetCookie().find((c) => /session_token=/.test(c));
  if (!line) throw new Error(`no session cookie in ${JSON.stringify(headers.getSetCookie())}`);
  const [pair, ...attributes] = line.split(";").map((part) => part.trim());
  return { name: pair.slice(0, pair.indexOf("=")), attributes: attributes.map((a) => a.toLowerCase()) };
}

const originalPublicUrl = process.env.PUBLIC_URL;
afterEach(() => {
  process.env.PUBLIC_URL = originalPublicUrl;
});

describe("session cookie attributes", () => {
  it("is HttpOnly and SameSite=Lax, and not Secure when the app is served over http", async () => {
    const result = await new RouteClient().action(signUp, "/sign-up", { name: "Cookie Http", email: uniqueEmail("cookie-http"), password: PASSWORD });
    expect(result.status).toBe(302);
    const cookie = sessionCookie(result.headers);
    expect(cookie.attributes).toContain("httponly");
    expect(cookie.attributes).toContain("samesite=lax");
    expect(cookie.attributes).not.toContain("secure");
  });

  it("is also Secure (and __Secure- prefixed) when PUBLIC_URL is https", async () => {
    process.env.PUBLIC_URL = "https://kitwright.example";
    vi.resetModules();
    const { auth } = await import("~/server/auth.server");
    const { pool } = await import("~/server/db.server");
    try {
      const { headers } = await auth.api.signUpEmail({
        body: { name: "Cookie Https", email: uniqueEmail("cookie-https"), password: PASSWORD },
        headers: new Headers({ Origin: "https://kitwright.example" }),
        returnHeaders: true,
      });
      const cookie = sessionCookie(headers);
      expect(cookie.name).toBe("__Secure-better-auth.session_token");
      expect(cookie.attributes).toEqual(expect.arrayContaining(["secure", "httponly", "samesite=lax"]));
    } finally {
      await pool.end();
    }
  });
});
