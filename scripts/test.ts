// npm test — everything, from a clean machine: Vitest (unit + integration against a PostgreSQL
// cluster of its own), then the production build: its server tests (two instances, a database
// outage) and the browser tests (Debian's Chromium, installed when absent) with the fakes running.
// Exits non-zero on any failure. The build goes to build-test/ (KITWRIGHT_BUILD_DIR), never to the
// build/ that a running `npm start` serves; every process started from here inherits the setting.
//   --no-e2e     unit and integration only
//   --e2e-only   production-server and browser tests only
//   --browser-only   browser tests only (no production-server project)
//   --production-only   production-server tests only (no browser tests)
//   other words  file filters for the production-server and browser projects, e.g. `quote-deposit`
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { databaseUrl, E2E_DATABASE, E2E_PORTS, TEST_CLUSTER } from "../tests/setup/test-env";
import { ensureCluster, ensureDatabase, findPostgresBinDir, startCluster, stopCluster } from "./lib/postgres-cluster";
import { isPortInUse, stopAll } from "./lib/processes";
import { appEnv, startAppServer, startFakes } from "./lib/services";

const args = new Set(process.argv.slice(2));
const filters = [...args].filter((a) => !a.startsWith("--"));
const runVitest = !args.has("--e2e-only") && !args.has("--browser-only") && !args.has("--production-only");
const runE2e = !args.has("--no-e2e");
const runProduction = !args.has("--browser-only");
const runBrowser = !args.has("--production-only");
// Always its own folder, even when the shell exports KITWRIGHT_BUILD_DIR for npm start.
process.env.KITWRIGHT_BUILD_DIR = "build-test";

function step(title: string) {
  console.log(`\n━━ ${title}`);
}

function run(command: string, argv: string[], env: NodeJS.ProcessEnv = {}) {
  const result = spawnSync(command, argv, { stdio: "inherit", env: { ...process.env, ...env } });
  return result.status === 0;
}

function ensureChromium() {
  if (existsSync(process.env.CHROMIUM_PATH ?? "/usr/bin/chromium")) return;
  step("Installing Debian's Chromium for the browser tests");
  if (!run("apt-get", ["update", "-qq"]) || !run("apt-get", ["install", "-y", "-qq", "chromium"])) {
    throw new Error("Could not install chromium from Debian's packages.");
  }
}

async function waitForFreePorts() {
  // Another browser-test run on this machine holds the ports: wait for it rather than rebuild under it.
  for (let waited = 0; waited < 600; waited += 5) {
    const busy = [];
    for (const [name, port] of Object.entries(E2E_PORTS)) if (await isPortInUse(port)) busy.push(`${port} (${name})`);
    if (!busy.length) return;
    if (waited === 0) console.log(`Waiting for ports ${busy.join(", ")} to be free (another test run?)…`);
    await new Promise((r) => setTimeout(r, 5000));
  }
  throw new Error("The browser-test ports stayed busy for 10 minutes.");
}

async function browserTests(): Promise<boolean> {
  if (runBrowser) ensureChromium();
  await waitForFreePorts();
  step(`Building the app into ${process.env.KITWRIGHT_BUILD_DIR}/`);
  if (!run("node_modules/.bin/react-router", ["build"])) return false;
  // Two production servers on a throwaway PostgreSQL of their own (free ports): sessions and limits
  // shared, cross-site writes refused, a database outage answered with 503 and recovered from.
  step("Production server tests (two instances, database outage)");
  const productionOk = runProduction ? run("node_modules/.bin/vitest", ["run", "--project", "production", "--passWithNoTests", ...filters]) : true;
  if (!runBrowser) return productionOk;
  const binDir = findPostgresBinDir();
  ensureCluster(TEST_CLUSTER, binDir);
  const startedHere = startCluster(TEST_CLUSTER, binDir);
  try {
    const url = databaseUrl(E2E_DATABASE);
    await ensureDatabase(TEST_CLUSTER.port, E2E_DATABASE, { fresh: true });
    const env = appEnv(E2E_PORTS, url);
    step("Migrating and seeding the browser-test database");
    if (!run("node_modules/.bin/tsx", ["scripts/migrate.ts"], env) || !run("node_modules/.bin/tsx", ["scripts/seed.ts"], env)) return false;
    await startFakes(env, E2E_PORTS);
    await startAppServer({ ...env, LOG_LEVEL: "warn" }, E2E_PORTS);
    step("Browser tests (Chromium)");
    const browserOk = run("node_modules/.bin/vitest", ["run", "--project", "e2e", "--passWithNoTests", ...filters], {
      ...env,
      E2E_BASE_URL: `http://127.0.0.1:${E2E_PORTS.app}`,
      E2E_MAIL_URL: `http://127.0.0.1:${E2E_PORTS.mailHttp}`,
    });
    return browserOk && productionOk;
  } finally {
    stopAll();
    if (startedHere) stopCluster(TEST_CLUSTER, binDir);
  }
}

let ok = true;
try {
  if (runVitest) {
    step("Unit and integration tests (Vitest, real PostgreSQL)");
    ok = run("node_modules/.bin/vitest", ["run", "--project", "unit", "--project", "integration"]) && ok;
  }
  if (runE2e) ok = (await browserTests()) && ok;
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  ok = false;
}
console.log(ok ? "\nAll tests passed." : "\nSome tests failed (see above).");
process.exit(ok ? 0 : 1);
