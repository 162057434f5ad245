// Boots what the HTTP benchmarks need: the test cluster with a fresh `kitwright_bench` database
// (migrated and seeded), the fakes, the production server, and a team API key.
import { serverBuildPath } from "../lib/build-dir";
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { createHash, randomBytes } from "node:crypto";
import pg from "pg";
import { databaseUrl, TEST_CLUSTER } from "../../tests/setup/test-env";
import { ensureCluster, ensureDatabase, findPostgresBinDir, startCluster, stopCluster } from "../lib/postgres-cluster";
import { startProcess, stopAll, waitForHttp } from "../lib/processes";
import { appEnv, startAppServer, startFakes, type ServicePorts } from "../lib/services";
import { memoryReportNodeOptions, removeMemoryReports } from "./server-memory";

export const BENCH_PORTS: ServicePorts = { app: 3320, smtp: 2725, mailHttp: 2790, payments: 12311 };
export const BARE_PORT = 3321;

function run(command: string, args: string[], env: NodeJS.ProcessEnv) {
  const result = spawnSync(command, args, { stdio: ["ignore", "ignore", "inherit"], env: { ...process.env, ...env } });
  if (result.status !== 0) throw new Error(`${command} ${args.join(" ")} failed`);
}

export async function bootBenchStack() {
  const binDir = findPostgresBinDir();
  ensureCluster(TEST_CLUSTER, binDir);
  const startedHere = startCluster(TEST_CLUSTER, binDir);
  const url = databaseUrl("kitwright_bench");
  await ensureDatabase(TEST_CLUSTER.port, "kitwright_bench", { fresh: true });
  const env = appEnv(BENCH_PORTS, url);
  run("node_modules/.bin/tsx", ["scripts/migrate.ts"], env);
  run("node_modules/.bin/tsx", ["scripts/seed.ts"], env);
  if (!existsSync(serverBuildPath()) || process.env.BENCH_BUILD !== "0") run("node_modules/.bin/react-router", ["build"], {});
  await startFakes(env, BENCH_PORTS);
  // SIGUSR2 makes the server write a diagnostic report: the bench reads its V8 heap from it.
  const server = await startAppServer({ ...env, LOG_LEVEL: "error", NODE_OPTIONS: memoryReportNodeOptions() }, BENCH_PORTS);
  startProcess("bare", "node_modules/.bin/tsx", ["scripts/bench/bare-server.ts"], { PORT: String(BARE_PORT) }, { quiet: true });
  await waitForHttp(`http://127.0.0.1:${BARE_PORT}/`);

  // A team API key made directly in the database (the same hashing as app/server/api-keys.server.ts).
  const key = `kw_${randomBytes(32).toString("base64url")}`;
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  const team = await client.query(`select id from organization where slug = 'tallowmere-power-works'`);
  await client.query(`insert into team_api_key (team_id, name, prefix, key_hash) values ($1, 'bench', $2, $3)`, [
    team.rows[0].id,
    key.slice(0, 10),
    createHash("sha256").update(key).digest("hex"),
  ]);
  const module = await client.query(`select id from pv_module order by maker, model limit 1`);
  await client.end();

  return {
    apiKey: key,
    moduleId: module.rows[0].id as string,
    serverPid: server.child.pid!,
    publicUrl: env.PUBLIC_URL!,
    stop() {
      stopAll();
      removeMemoryReports();
      if (startedHere) stopCluster(TEST_CLUSTER, binDir);
    },
  };
}
