// Secrets never reach the browser: no file of the client build (everything the server hands to
// browsers under /assets and /) holds the auth secret, the Stripe keys or a database address. The
// server bundle of the same build does hold the local defaults, which shows the search can find them.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { parseEnv } from "~/server/env-schema";
import { buildDirectory } from "../../scripts/lib/build-dir";

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? filesUnder(join(dir, entry.name)) : [join(dir, entry.name)]));
}

// The values this build would run with here, and the schema's defaults (what a careless import of
// the server's env module would bundle).
const configured = parseEnv({ ...process.env, NODE_ENV: "test" });
const defaults = parseEnv({});
const secrets = [...new Set([configured, defaults].flatMap((env) => [env.BETTER_AUTH_SECRET, env.STRIPE_SECRET_KEY, env.STRIPE_WEBHOOK_SECRET]))];
const needles = [...secrets, "postgres://", configured.DATABASE_URL];

describe("the client build", () => {
  const root = buildDirectory();
  const clientFiles = filesUnder(join(root, "client"));

  it("is the whole client: scripts, styles and the app's own words", () => {
    expect(clientFiles.some((f) => f.endsWith(".js"))).toBe(true);
    expect(clientFiles.some((f) => f.endsWith(".css"))).toBe(true);
    const scripts = clientFiles.filter((f) => f.endsWith(".js")).map((f) => readFileSync(f, "utf8"));
    expect(scripts.some((text) => text.includes("Kitwright"))).toBe(true);
  });

  it("holds no secret and no database address", () => {
    expect(secrets.length).toBeGreaterThanOrEqual(3);
    const found = clientFiles.flatMap((file) => {
      const text = readFileSync(file).toString("latin1");
      return needles.filter((needle) => text.includes(needle)).map((needle) => `${file}: ${needle.slice(0, 12)}…`);
    });
    expect(found).toEqual([]);
  });

  it("while the server bundle of the same build does carry the local defaults", () => {
    const server = filesUnder(join(root, "server"))
      .map((f) => readFileSync(f).toString("latin1"))
      .join("\n");
    for (const value of [defaults.BETTER_AUTH_SECRET, defaults.STRIPE_SECRET_KEY, "postgres://"]) expect(server).toContain(value);
  });
});
