// When PostgreSQL is down, restarting or refusing connections, every request that needs it answers
// 503 at once (a page for pages, JSON under /api/) instead of a 500 or a hang, and the next request
// after the database returns is served normally: the pool simply opens new connections.
// The production server wraps every route's loader and action with this (scripts/serve.ts).

export const DATABASE_UNAVAILABLE_MESSAGE = "Kitwright cannot reach its database right now. Please try again in a moment.";
const RETRY_AFTER_SECONDS = "5";

// Network errors from connecting, and PostgreSQL's SQLSTATEs for "not now": 57P01 admin shutdown,
// 57P02 crash shutdown, 57P03 cannot connect now (starting up or shutting down), 53300 too many
// connections, class 08 connection exceptions.
const UNAVAILABLE_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "ENOTFOUND",
  "EAI_AGAIN",
  "EPIPE",
  "57P01",
  "57P02",
  "57P03",
  "53300",
  "08000",
  "08001",
  "08003",
  "08004",
  "08006",
]);

// node-postgres reports a lost or never-made connection by message only.
const UNAVAILABLE_MESSAGES = [
  /timeout exceeded when trying to connect/i,
  /Connection terminated (unexpectedly|due to connection timeout)/i,
  /Client has encountered a connection error and is not queryable/i,
  /Client was closed and is not queryable/i,
];

export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (depth > 5 || typeof error !== "object" || error === null) return false;
  // fetch() to another service (mail, payments) fails with the same network codes in its cause.
  if (error instanceof TypeError && error.message === "fetch failed") return false;
  const { code, message, cause, errors } = error as { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown };
  if (typeof code === "string" && UNAVAILABLE_CODES.has(code)) return true;
  if (typeof message === "string" && UNAVAILABLE_MESSAGES.some((pattern) => pattern.test(message))) return true;
  if (Array.isArray(errors) && errors.some((inner) => isDatabaseUnavailable(inner, depth + 1))) return true;
  return isDatabaseUnavailable(cause, depth + 1);
}

export function databaseUnavailableResponse(request: Request) {
  const headers = { "Retry-After": RETRY_AFTER_SECONDS, "Cache-Control": "no-store" };
  if (new URL(request.url).pathname.startsWith("/api/")) {
    return Response.json({ error: { message: DATABASE_UNAVAILABLE_MESSAGE } }, { status: 503, headers });
  }
  // Thrown from a loader or action, this reaches the root ErrorBoundary as a 503 route error.
  return new Response(DATABASE_UNAVAILABLE_MESSAGE, { status: 503, statusText: "Service Unavailable", headers });
}

type Handler = (args: { request: Request }) => unknown;
interface RouteEntry {
  module: object;
}

/** A copy of the server build whose loaders and actions answer 503 while the database is unreachable. */
export function withDatabaseOutageAs503<Build extends { routes: Record<string, RouteEntry | undefined> }>(
  build: Build,
  log: (line: string) => void = (line) => console.error(line),
): Build {
  const guard = (handler: Handler): Handler =>
    async function guarded(args) {
      try {
        return await handler(args);
      } catch (error) {
        if (!isDatabaseUnavailable(error)) throw error;
        const code = (error as { code?: string }).code ?? (error as Error).message;
        log(JSON.stringify({ time: new Date().toISOString(), level: "error", msg: "database unavailable", path: new URL(args.request.url).pathname, code }));
        throw databaseUnavailableResponse(args.request);
      }
    };
  const routes = Object.fromEntries(
    Object.entries(build.routes).map(([id, route]) => {
      if (!route) return [id, route];
      const module: Record<string, unknown> = { ...route.module };
      for (const name of ["loader", "action"] as const) {
        if (typeof module[name] === "function") module[name] = guard(module[name] as Handler);
      }
      return [id, { ...route, module }];
    }),
  );
  return { ...build, routes };
}
