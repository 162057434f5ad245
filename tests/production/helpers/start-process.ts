// `npm start` (scripts/start.ts) run as a person runs it, on ports and a PostgreSQL data folder of the
// test's own, with its output captured. Detached: it leads its own process group, as a terminal's
// foreground job does, so that a test can send the group what Ctrl-C or a closing terminal sends.
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync } from "node:fs";
import { isClusterRunning } from "../../../scripts/lib/postgres-cluster";
import { isPortInUse } from "../../../scripts/lib/processes";
import { lockFileFor } from "../../../scripts/lib/start-lock";
import { freePort } from "./throwaway-stack";

export interface StartPorts {
  app: number;
  smtp: number;
  mailHttp: number;
  payments: number;
  pg: number;
}

export async function freeStartPorts(): Promise<StartPorts> {
  const ports: number[] = [];
  while (ports.length < 5) {
    const port = await freePort();
    if (!ports.includes(port)) ports.push(port);
  }
  const [app, smtp, mailHttp, payments, pg] = ports;
  return { app, smtp, mailHttp, payments, pg };
}

/** The environment of a start on these ports, reusing the build the test run made. */
export function startEnv(ports: StartPorts, dataDir: string): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    PORT: String(ports.app),
    MAIL_SMTP_PORT: String(ports.smtp),
    MAIL_HTTP_PORT: String(ports.mailHttp),
    PAYMENTS_PORT: String(ports.payments),
    KITWRIGHT_PG_PORT: String(ports.pg),
    KITWRIGHT_PGDATA: dataDir,
    KITWRIGHT_SKIP_BUILD: "1",
  };
  for (const name of ["PUBLIC_URL", "DATABASE_URL", "NODE_ENV", "BETTER_AUTH_SECRET"]) delete env[name];
  return env;
}

export interface Started {
  child: ChildProcess;
  output: () => string;
  exited: Promise<number | null>;
  waitFor: (text: string, timeoutMs?: number) => Promise<void>;
}

export function runStart(command: string, args: string[], env: NodeJS.ProcessEnv): Started {
  const child = spawn(command, args, { env, detached: true, stdio: ["ignore", "pipe", "pipe"] });
  let text = "";
  child.stdout?.on("data", (chunk) => (text += String(chunk)));
  child.stderr?.on("data", (chunk) => (text += String(chunk)));
  const exited = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
  let done = false;
  exited.then(() => (done = true));
  async function waitFor(needle: string, timeoutMs = 90_000) {
    const deadline = Date.now() + timeoutMs;
    while (!text.includes(needle)) {
      if (done) throw new Error(`the start ended before printing "${needle}":\n${text}`);
      if (Date.now() > deadline) throw new Error(`no "${needle}" within ${timeoutMs} ms:\n${text}`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  return { child, output: () => text, exited, waitFor };
}

export function isAlive(child: ChildProcess) {
  return child.exitCode === null && child.signalCode === null;
}

/** What is still left of a start: busy ports, a running cluster, a lock file. Empty once it stopped. */
export async function leftovers(ports: StartPorts, dataDir: string, binDir: string) {
  const left: string[] = [];
  for (const [name, port] of Object.entries(ports)) if (await isPortInUse(port)) left.push(`port ${port} (${name})`);
  if (isClusterRunning({ port: ports.pg, dataDir }, binDir)) left.push("PostgreSQL");
  if (existsSync(lockFileFor(ports.app))) left.push("lock file");
  return left;
}

/** Waits until nothing of the start is left, or returns what still is after `timeoutMs`. */
export async function waitUntilStopped(ports: StartPorts, dataDir: string, binDir: string, timeoutMs = 20_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const left = await leftovers(ports, dataDir, binDir);
    if (!left.length || Date.now() > deadline) return left;
    await new Promise((r) => setTimeout(r, 250));
  }
}
