import { describe, expect, it } from "vitest";
import { crossOriginRefusal } from "~/server/cross-origin.server";

const PUBLIC_URL = "https://kitwright.example";
const post = (fields: Partial<Parameters<typeof crossOriginRefusal>[0]> = {}) =>
  crossOriginRefusal({ method: "POST", path: "/sign-in", ...fields }, PUBLIC_URL);

describe("crossOriginRefusal", () => {
  it("lets a write from the app's own origin pass", () => {
    expect(post({ origin: "https://kitwright.example" })).toBeNull();
  });

  it("refuses a write from another site, for every state-changing method", () => {
    for (const method of ["POST", "PUT", "PATCH", "DELETE", "post"]) {
      expect(crossOriginRefusal({ method, path: "/api/v1/sites", origin: "https://evil.example" }, PUBLIC_URL)).toMatch(/evil\.example/);
    }
  });

  it("compares whole origins: scheme and port count, a look-alike host does not pass", () => {
    expect(post({ origin: "http://kitwright.example" })).not.toBeNull();
    expect(post({ origin: "https://kitwright.example:8443" })).not.toBeNull();
    expect(post({ origin: "https://kitwright.example.evil.example" })).not.toBeNull();
    expect(post({ origin: "null" })).not.toBeNull();
  });

  it("falls back to Referer only when Origin is absent", () => {
    expect(post({ referer: "https://kitwright.example/sign-in?x=1" })).toBeNull();
    expect(post({ referer: "https://evil.example/page" })).not.toBeNull();
    expect(post({ origin: "https://evil.example", referer: "https://kitwright.example/" })).not.toBeNull();
  });

  it("refuses a write with neither Origin nor Referer", () => {
    expect(post()).toMatch(/neither Origin nor Referer/);
    expect(post({ referer: "not a url" })).not.toBeNull();
  });

  it("lets reads through from anywhere", () => {
    for (const method of ["GET", "HEAD", "OPTIONS"]) expect(crossOriginRefusal({ method, path: "/", origin: "https://evil.example" }, PUBLIC_URL)).toBeNull();
  });

  it("exempts the payments webhook and API-key requests, nothing else", () => {
    expect(post({ path: "/api/v1/payments/webhook" })).toBeNull();
    expect(post({ path: "/api/v1/payments/webhook/other" })).not.toBeNull();
    expect(post({ path: "/api/v1/sites", authorization: "Bearer kw_abc" })).toBeNull();
    expect(post({ path: "/api/v1/sites", authorization: "Basic dXNlcjpwYXNz" })).not.toBeNull();
    expect(post({ path: "/api/v1/sites", authorization: "Bearer " })).not.toBeNull();
  });
});
