// The environment checks made at boot: the app's schema (app/server/env-schema.ts) and the production
// server's own variables (scripts/lib/server-env.ts). Bad values stop the boot with their name.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { DEFAULT_AUTH_SECRET, envSchema, InvalidEnvironment, parseEnv } from "~/server/env-schema";
import { parseServerEnv } from "../../../scripts/lib/server-env";

const REAL_SECRET = "q7Vt0mZ2pL9xW4sB8nK1cR6yH3dJ5fG0aE2uT7iO9lM";

function problemsOf(run: () => unknown): string[] {
  try {
    run();
  } catch (error) {
    if (error instanceof InvalidEnvironment) return error.problems;
    throw error;
  }
  throw new Error("expected the environment to be refused");
}

describe("app environment", () => {
  it("fills every variable with its local default when nothing is set", () => {
    const env = parseEnv({});
    expect(env).toMatchObject({ NODE_ENV: "development", PORT: 3000, DATABASE_POOL_MAX: 10, ENABLE_DEV_OUTBOX: false });
    expect(env.DATABASE_URL).toBe("postgres://postgres@127.0.0.1:54320/kitwright");
  });

  it("reads good values", () => {
    const env = parseEnv({ NODE_ENV: "production", PORT: "8080", BETTER_AUTH_SECRET: REAL_SECRET, ENABLE_DEV_OUTBOX: "1", DATABASE_POOL_MAX: "4" });
    expect(env).toMatchObject({ NODE_ENV: "production", PORT: 8080, ENABLE_DEV_OUTBOX: true, DATABASE_POOL_MAX: 4, BETTER_AUTH_SECRET: REAL_SECRET });
  });

  it("refuses the default auth secret in production", () => {
    expect(problemsOf(() => parseEnv({ NODE_ENV: "production" }))).toEqual(["  BETTER_AUTH_SECRET: set a real secret in production"]);
    expect(problemsOf(() => parseEnv({ NODE_ENV: "production", BETTER_AUTH_SECRET: DEFAULT_AUTH_SECRET, ENABLE_DEV_OUTBOX: "false" }))).toHaveLength(1);
    // npm start: production mode on this machine only, recognisable by its development outbox.
    expect(parseEnv({ NODE_ENV: "production", ENABLE_DEV_OUTBOX: "true" }).BETTER_AUTH_SECRET).toBe(DEFAULT_AUTH_SECRET);
    expect(parseEnv({ NODE_ENV: "production", BETTER_AUTH_SECRET: REAL_SECRET }).BETTER_AUTH_SECRET).toBe(REAL_SECRET);
  });

  it("names every bad variable at once", () => {
    const problems = problemsOf(() =>
      parseEnv({
        NODE_ENV: "staging",
        PORT: "70000",
        PUBLIC_URL: "app.example",
        DATABASE_URL: "mysql://db/kitwright",
        BETTER_AUTH_SECRET: "short",
        ENABLE_DEV_OUTBOX: "yes",
      }),
    );
    const names = problems.map((line) => line.trim().split(":")[0]).sort();
    expect(names).toEqual(["BETTER_AUTH_SECRET", "DATABASE_URL", "ENABLE_DEV_OUTBOX", "NODE_ENV", "PORT", "PUBLIC_URL"]);
    expect(problems).toContain("  BETTER_AUTH_SECRET: BETTER_AUTH_SECRET must be at least 32 characters");
  });
});

describe("production server environment", () => {
  it("defaults to loopback, every request logged, no proxy and the build in build/", () => {
    const env = parseServerEnv({});
    expect(env).toMatchObject({ HOST: "127.0.0.1", LOG_LEVEL: "info", TRUST_PROXY: 0, SERVER_BUILD: "build/server/index.js" });
  });

  it("reads good values, and treats an empty variable as unset", () => {
    const env = parseServerEnv({ HOST: "0.0.0.0", LOG_LEVEL: "warn", TRUST_PROXY: "1", PORT: "3310" });
    expect(env).toMatchObject({ HOST: "0.0.0.0", LOG_LEVEL: "warn", TRUST_PROXY: 1, PORT: 3310 });
    expect(parseServerEnv({ HOST: "::", LOG_LEVEL: "", TRUST_PROXY: "" })).toMatchObject({ HOST: "::", LOG_LEVEL: "info", TRUST_PROXY: 0 });
  });

  it("takes the server bundle from SERVER_BUILD, else from the build folder (build-test/ in npm test)", () => {
    expect(parseServerEnv({ SERVER_BUILD: "/srv/kitwright/server/index.js" }).SERVER_BUILD).toBe("/srv/kitwright/server/index.js");
    expect(parseServerEnv({ KITWRIGHT_BUILD_DIR: "build-test" }).SERVER_BUILD).toBe("build-test/server/index.js");
  });

  it("refuses values it used to ignore silently, with the app's problems in the same list", () => {
    const problems = problemsOf(() =>
      parseServerEnv({ HOST: "local host", LOG_LEVEL: "debug", TRUST_PROXY: "one", SERVER_BUILD: "build/server", NODE_ENV: "production" }),
    );
    const names = problems.map((line) => line.trim().split(":")[0]).sort();
    expect(names).toEqual(["BETTER_AUTH_SECRET", "HOST", "LOG_LEVEL", "SERVER_BUILD", "TRUST_PROXY"]);
    expect(problems).toContain("  LOG_LEVEL: LOG_LEVEL is info (every request), warn (4xx and 5xx) or error (5xx only)");
    expect(problems).toContain("  TRUST_PROXY: TRUST_PROXY is the number of proxies in front of the app: 0 (none), 1, 2…");
    expect(problemsOf(() => parseServerEnv({ TRUST_PROXY: "-1" }))).toHaveLength(1);
    expect(problemsOf(() => parseServerEnv({ TRUST_PROXY: "true" }))).toHaveLength(1);
  });
});

describe(".env.example", () => {
  function sources(dir: string): string[] {
    return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
      e.isDirectory() ? sources(join(dir, e.name)) : /\.tsx?$/.test(e.name) ? [join(dir, e.name)] : [],
    );
  }
  const listed = new Set(
    readFileSync(".env.example", "utf8")
      .split("\n")
      .filter((line) => /^[A-Z][A-Z0-9_]*=/.test(line))
      .map((line) => line.split("=")[0]),
  );

  it("lists every variable of the schema and every one the code reads", () => {
    const read = new Set<string>(Object.keys(envSchema.shape));
    for (const file of ["app", "scripts", "fakes", "tests/e2e", "tests/setup"].flatMap(sources)) {
      for (const match of readFileSync(file, "utf8").matchAll(/process\.env\.([A-Z][A-Z0-9_]*)/g)) read.add(match[1]);
    }
    read.delete("NODE_OPTIONS"); // Node's own, extended by the benchmark
    const missing = [...read].filter((name) => !listed.has(name)).sort();
    expect(missing).toEqual([]);
    expect(read.size).toBeGreaterThan(30);
  });

  it("holds values the checks accept, except the secret that production must replace", () => {
    const example = Object.fromEntries([...listed].map((name) => [name, exampleValue(name)]));
    expect(example.NODE_ENV).toBe("production");
    expect(problemsOf(() => parseServerEnv(example))).toEqual(["  BETTER_AUTH_SECRET: set a real secret in production"]);
    expect(parseServerEnv({ ...example, BETTER_AUTH_SECRET: REAL_SECRET })).toMatchObject({
      PORT: 3000,
      TRUST_PROXY: 0,
      SERVER_BUILD: "build/server/index.js",
    });
  });

  function exampleValue(name: string) {
    const line = readFileSync(".env.example", "utf8")
      .split("\n")
      .find((l) => l.startsWith(`${name}=`))!;
    return line.slice(name.length + 1);
  }
});
