// `npm start` on a machine of its own: a fresh cluster boots with the demo data and prints the
// sign-ins; a second start is refused and says why; Ctrl-C, SIGTERM to npm and a closed terminal
// each stop every process and the project's PostgreSQL; a restart keeps the data.
// Free ports and a throwaway data folder: the `npm start` a developer may be running is untouched.
import { readFileSync, rmSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "../../data/demo/people";
import { findPostgresBinDir, stopCluster } from "../../scripts/lib/postgres-cluster";
import { lockFileFor } from "../../scripts/lib/start-lock";
import { call, cookiesOf } from "./helpers/http";
import { freeStartPorts, isAlive, runStart, startEnv, waitUntilStopped, type Started, type StartPorts } from "./helpers/start-process";

let ports: StartPorts;
let dataDir: string;
let env: NodeJS.ProcessEnv;
let binDir: string;
const started: Started[] = [];

function npmStart() {
  const run = runStart("npm", ["start", "--silent"], env);
  started.push(run);
  return run;
}

async function signInDemo(email: string) {
  const host = `127.0.0.1:${ports.app}`;
  const answer = await call(ports.app, host, "/sign-in", { form: { email, password: DEMO_PASSWORD }, headers: { Origin: `http://${host}` } });
  return { status: answer.status, cookie: cookiesOf(answer) };
}

beforeAll(async () => {
  binDir = findPostgresBinDir();
  ports = await freeStartPorts();
  dataDir = `/var/tmp/kitwright-pg-start-test-${ports.pg}`;
  rmSync(dataDir, { recursive: true, force: true });
  env = startEnv(ports, dataDir);
});

afterAll(async () => {
  if (!ports) return;
  for (const run of started) if (run.child.pid && isAlive(run.child)) process.kill(-run.child.pid, "SIGKILL");
  stopCluster({ port: ports.pg, dataDir }, binDir);
  rmSync(dataDir, { recursive: true, force: true });
  rmSync(lockFileFor(ports.app), { force: true });
});

describe("npm start", () => {
  let first: Started;

  it("boots a fresh cluster, loads the demo and prints the app's address and the demo sign-ins", { timeout: 150_000 }, async () => {
    first = npmStart();
    await first.waitFor("Press Ctrl-C to stop everything.", 120_000);
    const out = first.output();
    expect(out).toContain(`App             http://127.0.0.1:${ports.app}`);
    expect(out).toContain(`postgres://postgres@127.0.0.1:${ports.pg}/kitwright`);
    expect(out).toContain("Demo data loaded into the empty database.");
    for (const user of DEMO_USERS) expect(out).toContain(user.email);
    expect(out).toContain(`(password for all: "${DEMO_PASSWORD}")`);
    const health = await fetch(`http://127.0.0.1:${ports.app}/healthz`);
    expect(health.status).toBe(200);
    const demo = await signInDemo(DEMO_USERS[0].email);
    expect(demo.status).toBe(302);
    expect(demo.cookie).toMatch(/session_token=/);
  });

  it("refuses a second start with the same settings, naming the copy that runs", async () => {
    const lock = JSON.parse(readFileSync(lockFileFor(ports.app), "utf8"));
    const second = runStart("node_modules/.bin/tsx", ["scripts/start.ts"], env);
    expect(await second.exited).toBe(1);
    expect(second.output()).toContain(`Kitwright is already running (process ${lock.pid}) at http://127.0.0.1:${ports.app}.`);
    expect(isAlive(first.child)).toBe(true);
    expect((await fetch(`http://127.0.0.1:${ports.app}/healthz`)).status).toBe(200);
  });

  it("refuses a second start on another PORT, naming every port it shares and its variable", async () => {
    const [otherApp] = Object.values(await freeStartPorts());
    const second = runStart("node_modules/.bin/tsx", ["scripts/start.ts"], { ...env, PORT: String(otherApp) });
    expect(await second.exited).toBe(1);
    const out = second.output();
    expect(out).toContain("Kitwright cannot start: these ports are already in use:");
    expect(out).toContain(`${ports.smtp} (the mail fake's SMTP, MAIL_SMTP_PORT)`);
    expect(out).toContain(`${ports.mailHttp} (the mail fake's HTTP API, MAIL_HTTP_PORT)`);
    expect(out).toContain(`${ports.payments} (the payments fake, PAYMENTS_PORT)`);
    expect(out).toContain(`${ports.pg} (PostgreSQL, KITWRIGHT_PG_PORT`);
    expect(out).not.toContain(`${otherApp} (the app, PORT)`);
    expect(out).toContain(`at http://127.0.0.1:${ports.app} with PostgreSQL on ${ports.pg}`);
  });

  it("stops every process, its PostgreSQL and the lock on Ctrl-C (SIGINT to the process group)", { timeout: 60_000 }, async () => {
    process.kill(-first.child.pid!, "SIGINT");
    await first.exited;
    expect(await waitUntilStopped(ports, dataDir, binDir), first.output()).toEqual([]);
    expect(first.output()).toContain("Stopping Kitwright");
  });

  it("keeps the data on a restart, and stops everything on SIGTERM to npm alone", { timeout: 150_000 }, async () => {
    const again = npmStart();
    await again.waitFor("Press Ctrl-C to stop everything.", 120_000);
    expect(again.output()).toContain("Existing data kept.");
    expect(again.output()).not.toContain("Demo data loaded");
    expect((await signInDemo(DEMO_USERS[1].email)).status).toBe(302);
    // What a process manager does: npm and its `sh` end at once; the rest notices and stops.
    process.kill(again.child.pid!, "SIGTERM");
    expect(await waitUntilStopped(ports, dataDir, binDir), again.output()).toEqual([]);
    expect(again.output()).toMatch(/Stopping Kitwright \((its parent process|the process that started it) \(?\d+\)? ended\)/);
  });

  it("stops everything when its terminal closes (SIGHUP to the process group)", { timeout: 150_000 }, async () => {
    const again = npmStart();
    await again.waitFor("Press Ctrl-C to stop everything.", 120_000);
    process.kill(-again.child.pid!, "SIGHUP");
    expect(await waitUntilStopped(ports, dataDir, binDir), again.output()).toEqual([]);
    expect(again.output()).toContain("Stopping Kitwright (SIGHUP");
  });
});
