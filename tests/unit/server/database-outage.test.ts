import { describe, expect, it } from "vitest";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable, withDatabaseOutageAs503 } from "~/server/database-outage.server";

function pgError(code: string, message = "x") {
  return Object.assign(new Error(message), { code });
}

describe("isDatabaseUnavailable", () => {
  it("recognises a refused connection, shutdowns and start-up", () => {
    expect(isDatabaseUnavailable(pgError("ECONNREFUSED", "connect ECONNREFUSED 127.0.0.1:5432"))).toBe(true);
    expect(isDatabaseUnavailable(pgError("57P01", "terminating connection due to administrator command"))).toBe(true);
    expect(isDatabaseUnavailable(pgError("57P03", "the database system is starting up"))).toBe(true);
    expect(isDatabaseUnavailable(pgError("08006"))).toBe(true);
  });

  it("recognises node-postgres's connection timeout and lost connections by message", () => {
    expect(isDatabaseUnavailable(new Error("timeout exceeded when trying to connect"))).toBe(true);
    expect(isDatabaseUnavailable(new Error("Connection terminated unexpectedly"))).toBe(true);
    expect(isDatabaseUnavailable(new Error("Connection terminated due to connection timeout"))).toBe(true);
  });

  it("looks inside causes and aggregate errors (both address families refused)", () => {
    expect(isDatabaseUnavailable(new Error("wrapped", { cause: pgError("ECONNREFUSED") }))).toBe(true);
    expect(isDatabaseUnavailable(new AggregateError([pgError("ECONNREFUSED"), pgError("ECONNREFUSED")]))).toBe(true);
  });

  it("leaves every other error alone: bad SQL, constraint violations, bugs, other services down", () => {
    expect(isDatabaseUnavailable(pgError("42P01", 'relation "nope" does not exist'))).toBe(false);
    expect(isDatabaseUnavailable(pgError("23505", "duplicate key value violates unique constraint"))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("cannot read properties of undefined"))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("fetch failed", { cause: pgError("ECONNREFUSED") }))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
    expect(isDatabaseUnavailable("ECONNREFUSED")).toBe(false);
  });
});

describe("withDatabaseOutageAs503", () => {
  const refused = pgError("ECONNREFUSED");
  const build = {
    version: "b1",
    routes: {
      root: { id: "root", module: { default: "Root", loader: async () => "root data" } },
      page: { id: "page", module: { default: "Page", loader: async () => Promise.reject(refused), action: async () => Promise.reject(new Error("a bug")) } },
      api: { id: "api", module: { loader: async () => Promise.reject(refused) } },
    },
  };
  const wrapped = withDatabaseOutageAs503(build, () => {});
  const call = (id: keyof typeof build.routes, name: "loader" | "action", url: string) =>
    (wrapped.routes[id].module as any)[name]({ request: new Request(url), params: {}, context: {} });

  it("answers a page's loader with a 503 route error carrying the message", async () => {
    const thrown = await call("page", "loader", "http://app.test/sites").catch((e: unknown) => e);
    expect(thrown).toBeInstanceOf(Response);
    expect((thrown as Response).status).toBe(503);
    expect((thrown as Response).headers.get("Retry-After")).toBe("5");
    expect(await (thrown as Response).text()).toBe(DATABASE_UNAVAILABLE_MESSAGE);
  });

  it("answers an /api/ route with 503 JSON", async () => {
    const thrown = (await call("api", "loader", "http://app.test/api/v1/sites").catch((e: unknown) => e)) as Response;
    expect(thrown.status).toBe(503);
    expect(await thrown.json()).toEqual({ error: { message: DATABASE_UNAVAILABLE_MESSAGE } });
  });

  it("passes results and other errors through untouched, and keeps the rest of the build", async () => {
    expect(await call("root", "loader", "http://app.test/")).toBe("root data");
    await expect(call("page", "action", "http://app.test/sites")).rejects.toThrow("a bug");
    expect(wrapped.version).toBe("b1");
    expect(wrapped.routes.page.module.default).toBe("Page");
    expect("action" in wrapped.routes.api.module).toBe(false);
    expect(build.routes.page.module.loader).not.toBe(wrapped.routes.page.module.loader);
  });
});
