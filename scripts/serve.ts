// The production HTTP server: static assets, security headers, a request id and one structured log
// line per request, then React Router's handler. Stateless: run as many as you like behind a load
// balancer, all on one PostgreSQL (see README, "Running more than one instance").
import { randomUUID } from "node:crypto";
import { existsSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { createRequestHandler } from "@react-router/express";
import compression from "compression";
import express, { type NextFunction, type Request, type Response } from "express";
import type { ServerBuild } from "react-router";
import { withDatabaseOutageAs503 } from "../app/server/database-outage.server";
import { withRequestLimits } from "../app/server/request-limits.server";
import { InvalidEnvironment } from "../app/server/env-schema";
import { clientIpHeader, refuseCrossOriginWrites, trustProxySetting } from "./lib/request-guards";
import { securityHeaders } from "./lib/security-headers";
import { parseServerEnv, type ServerEnv } from "./lib/server-env";

let settings: ServerEnv;
try {
  settings = parseServerEnv(process.env);
} catch (error) {
  if (!(error instanceof InvalidEnvironment)) throw error;
  console.error(`Kitwright cannot start. ${error.message}\nEvery variable and its default: .env.example.`);
  process.exit(1);
}
const { PORT: port, HOST: host, PUBLIC_URL: publicUrl } = settings;
const logLevel = settings.LOG_LEVEL; // "info": every request; "warn": 4xx and 5xx only; "error": 5xx only
const buildPath = path.resolve(settings.SERVER_BUILD);
if (!existsSync(buildPath)) {
  console.error(`Kitwright cannot start: no production build at ${buildPath}. Run \`npm run build\` first (or set SERVER_BUILD).`);
  process.exit(1);
}

function log(fields: Record<string, unknown>) {
  process.stdout.write(`${JSON.stringify({ time: new Date().toISOString(), ...fields })}\n`);
}

function requestLog(req: Request, res: Response, next: NextFunction) {
  const incoming = req.get("X-Request-Id");
  const id = incoming && /^[\w-]{8,64}$/.test(incoming) ? incoming : randomUUID();
  res.setHeader("X-Request-Id", id);
  const started = process.hrtime.bigint();
  res.on("finish", () => {
    const status = res.statusCode;
    const level = status >= 500 ? "error" : status >= 400 ? "warn" : "info";
    if ((logLevel === "warn" && level === "info") || (logLevel === "error" && level !== "error")) return;
    // The path only: query strings can carry tokens (password reset links), never logged.
    log({ level, msg: "request", id, method: req.method, path: req.path, status, ms: Number(process.hrtime.bigint() - started) / 1e6 });
  });
  next();
}

// Database outages answer 503 from any loader or action (app/server/database-outage.server.ts);
// oversized bodies, runaway form field names and NUL characters are refused before any route runs
// (app/server/request-limits.server.ts).
const build = withRequestLimits(withDatabaseOutageAs503((await import(pathToFileURL(buildPath).href)) as ServerBuild));
const app = express();
app.disable("x-powered-by");
app.set("trust proxy", trustProxySetting(String(settings.TRUST_PROXY)));
app.use(requestLog);
app.use(securityHeaders);
app.use(clientIpHeader);
app.use(refuseCrossOriginWrites(publicUrl));
app.use(compression());
app.use("/assets", express.static(path.join(path.dirname(buildPath), "../client/assets"), { immutable: true, maxAge: "1y" }));
// Other public files (favicon…): only paths that look like files, so a page request costs no stat().
const publicFiles = express.static(path.join(path.dirname(buildPath), "../client"), { maxAge: "1h", index: false });
app.use((req, res, next) => (/\.[a-z0-9]+$/i.test(req.path) ? publicFiles(req, res, next) : next()));
app.all("*", createRequestHandler({ build, mode: process.env.NODE_ENV ?? "production" }));

const server = app.listen(port, host, () => log({ level: "info", msg: "listening", url: `http://${host}:${port}` }));
server.keepAliveTimeout = 65_000;
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => server.close(() => process.exit(0)));
}
