// A PostgreSQL cluster of its own (free port, data under /var/tmp, removed afterwards) and N
// production servers (scripts/serve.ts on the production build) sharing its one database, as behind
// a load balancer: same PUBLIC_URL and secret, different ports. The cluster can be stopped and
// started under the running servers.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, rmSync } from "node:fs";
import net from "node:net";
import { ensureCluster, ensureDatabase, findPostgresBinDir, startCluster, stopCluster, type ClusterOptions } from "../../../scripts/lib/postgres-cluster";
import { serverBuildPath } from "../../../scripts/lib/build-dir";
import { waitForHttp } from "../../../scripts/lib/processes";

export const PUBLIC_HOST = "app.kitwright.test";
export const PUBLIC_URL = `http://${PUBLIC_HOST}`;

export interface AppInstance {
  port: number;
  child: ChildProcess;
  output: string[];
  /** Standard output alone (the JSON request log), also part of `output`. */
  stdout: string[];
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

export interface StackOptions {
  /** Extra environment for every instance (e.g. LOG_LEVEL), over the defaults below. */
  env?: Record<string, string>;
}

export async function startThrowawayStack(instanceCount: number, options: StackOptions = {}) {
  if (!existsSync(serverBuildPath()))
    throw new Error(`No production build at ${serverBuildPath()}: run \`npm run build\` first (npm test builds before this).`);
  const binDir = findPostgresBinDir();
  const pgPort = await freePort();
  const cluster: ClusterOptions = { port: pgPort, dataDir: `/var/tmp/kitwright-pg-outage-${pgPort}` };
  rmSync(cluster.dataDir, { recursive: true, force: true });
  const instances: AppInstance[] = [];
  const databaseUrl = `postgres://postgres@127.0.0.1:${pgPort}/kitwright`;
  async function stop() {
    await Promise.all(instances.map(stopInstance));
    stopCluster(cluster, binDir);
    rmSync(cluster.dataDir, { recursive: true, force: true });
  }
  try {
    ensureCluster(cluster, binDir);
    startCluster(cluster, binDir);
    await ensureDatabase(pgPort, "kitwright");
    const migrate = spawnSync("node_modules/.bin/tsx", ["scripts/migrate.ts"], { env: { ...process.env, DATABASE_URL: databaseUrl }, encoding: "utf8" });
    if (migrate.status !== 0) throw new Error(`migrations failed: ${migrate.stderr}`);
    const secret = randomBytes(32).toString("base64url");
    for (let i = 0; i < instanceCount; i++) instances.push(startInstance(await freePort(), databaseUrl, secret, options.env));
    await Promise.all(instances.map((instance) => waitForHttp(`http://127.0.0.1:${instance.port}/healthz`, 30000)));
  } catch (error) {
    await stop();
    throw error;
  }

  return {
    instances,
    /** For tests that seed or inspect the database directly. */
    databaseUrl,
    stopDatabase: () => stopCluster(cluster, binDir),
    startDatabase: () => startCluster(cluster, binDir),
    stop,
  };
}

function startInstance(port: number, databaseUrl: string, secret: string, extraEnv: Record<string, string> = {}): AppInstance {
  const env = {
    ...process.env,
    NODE_ENV: "production",
    HOST: "127.0.0.1",
    PORT: String(port),
    PUBLIC_URL,
    DATABASE_URL: databaseUrl,
    DATABASE_POOL_MAX: "4",
    BETTER_AUTH_SECRET: secret,
    ENABLE_DEV_OUTBOX: "false",
    TRUST_PROXY: "0",
    LOG_LEVEL: "error",
    ...extraEnv,
  };
  const child = spawn(process.execPath, ["--enable-source-maps", "--import", "tsx", "scripts/serve.ts"], { env, stdio: ["ignore", "pipe", "pipe"] });
  const output: string[] = [];
  const stdout: string[] = [];
  child.stdout?.on("data", (chunk) => {
    output.push(String(chunk));
    stdout.push(String(chunk));
  });
  child.stderr?.on("data", (chunk) => output.push(String(chunk)));
  return { port, child, output, stdout };
}

function stopInstance({ child }: AppInstance): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const hardStop = setTimeout(() => child.kill("SIGKILL"), 5000);
    child.once("exit", () => {
      clearTimeout(hardStop);
      resolve();
    });
    child.kill("SIGTERM");
  });
}
