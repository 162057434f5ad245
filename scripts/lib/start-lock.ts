// One `npm start` per app port: a lock file names the process and the ports it holds, so that a
// second start says which copy runs, and which ports (and the variables that set them) are taken.
import { existsSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { isPortInUse } from "./processes";
import type { ServicePorts } from "./services";

const LOCK_DIR = "/var/tmp";
const LOCK_PREFIX = "kitwright-start-";

export interface LockInfo {
  pid: number;
  app: number;
  /** Absent in lock files written before the PostgreSQL port was recorded. */
  pgPort?: number;
}

const PORT_NAMES: Record<keyof ServicePorts, string> = {
  app: "the app, PORT",
  smtp: "the mail fake's SMTP, MAIL_SMTP_PORT",
  mailHttp: "the mail fake's HTTP API, MAIL_HTTP_PORT",
  payments: "the payments fake, PAYMENTS_PORT",
};

export function lockFileFor(appPort: number) {
  return join(LOCK_DIR, `${LOCK_PREFIX}${appPort}.pid`);
}

function isAlive(pid: number) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

function readLock(file: string): LockInfo | null {
  if (!existsSync(file)) return null;
  const text = readFileSync(file, "utf8").trim();
  const app = Number(file.slice(file.lastIndexOf("-") + 1, -".pid".length));
  // Older lock files hold the process id alone; an unreadable one counts as no lock.
  let info: LockInfo;
  try {
    info = text.startsWith("{") ? JSON.parse(text) : { pid: Number(text), app };
  } catch {
    return null;
  }
  return Number.isInteger(info.pid) && info.pid > 0 && isAlive(info.pid) ? info : null;
}

/** The copy of Kitwright holding this app port, if one runs. */
export function runningStart(appPort: number) {
  return readLock(lockFileFor(appPort));
}

/** Every copy of Kitwright started on this machine that still runs. */
export function otherStarts(): LockInfo[] {
  return readdirSync(LOCK_DIR)
    .filter((name) => name.startsWith(LOCK_PREFIX) && name.endsWith(".pid"))
    .map((name) => readLock(join(LOCK_DIR, name)))
    .filter((info): info is LockInfo => info !== null && info.pid !== process.pid);
}

/**
 * Takes the lock for this app port, or returns the copy that holds it. The file is created exclusively
 * ("wx"), so of two starts racing for the port only one wins; a lock left by a process that no longer
 * runs is replaced.
 */
export function claimLock(ports: ServicePorts, pgPort: number): LockInfo | null {
  const file = lockFileFor(ports.app);
  const text = JSON.stringify({ pid: process.pid, app: ports.app, pgPort } satisfies LockInfo);
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      writeFileSync(file, text, { flag: "wx" });
      return null;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
      const holder = readLock(file);
      if (holder) return holder;
      rmSync(file, { force: true }); // stale: its process has ended
    }
  }
  throw new Error(`Could not take the start lock ${file}.`);
}

export function removeLock(appPort: number) {
  rmSync(lockFileFor(appPort), { force: true });
}

/**
 * Every port this start needs that something else holds, as "port (what, VARIABLE)". The PostgreSQL
 * port counts when a program other than our own cluster holds it, or when another running copy of
 * Kitwright uses that cluster (it would be stopped under us). Our own cluster, left running by a
 * start that was killed, is reused.
 */
export async function busyPorts(ports: ServicePorts, pgPort: number, others: LockInfo[], isOwnClusterRunning: () => boolean) {
  const busy: string[] = [];
  for (const [name, port] of Object.entries(ports) as [keyof ServicePorts, number][]) {
    if (await isPortInUse(port)) busy.push(`${port} (${PORT_NAMES[name]})`);
  }
  if (await isPortInUse(pgPort)) {
    const shared = others.some((o) => o.pgPort === pgPort);
    if (shared || !isOwnClusterRunning()) busy.push(`${pgPort} (PostgreSQL, KITWRIGHT_PG_PORT; its data folder: KITWRIGHT_PGDATA)`);
  }
  return busy;
}

export function busyPortsMessage(busy: string[], others: LockInfo[]) {
  const holders = others.map((o) => `  Kitwright, process ${o.pid}, at http://127.0.0.1:${o.app}${o.pgPort ? ` with PostgreSQL on ${o.pgPort}` : ""}`);
  return [
    "Kitwright cannot start: these ports are already in use:",
    ...busy.map((line) => `  ${line}`),
    ...(holders.length ? ["Running on this machine:", ...holders] : []),
    "Stop the program that holds them, or set the variables above to free ports for this copy (see .env.example).",
  ].join("\n");
}
