// A PostgreSQL cluster owned by the project: installed from Debian when absent, initialised in a
// data directory outside the repo, listening on loopback on a non-default port. Used by
// `npm start` (scripts/start.ts) and `npm test` (scripts/test.ts) with different ports and folders.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, chownSync, readFileSync } from "node:fs";
import { join } from "node:path";
import pg from "pg";

export interface ClusterOptions {
  dataDir: string;
  port: number;
}

function run(cmd: string, args: string[], opts: { asPostgres?: boolean; quiet?: boolean } = {}) {
  const isRoot = process.getuid?.() === 0;
  const [file, argv] = opts.asPostgres && isRoot ? ["runuser", ["-u", "postgres", "--", cmd, ...args]] : [cmd, args];
  const result = spawnSync(file, argv, { stdio: opts.quiet ? "pipe" : "inherit", encoding: "utf8" });
  if (result.status !== 0) {
    const detail = opts.quiet ? `\n${result.stdout ?? ""}${result.stderr ?? ""}` : "";
    throw new Error(`${cmd} ${args.join(" ")} failed with status ${result.status}${detail}`);
  }
  return result.stdout ?? "";
}

/** Finds the newest installed PostgreSQL server binaries; installs Debian's package when none. */
export function findPostgresBinDir(): string {
  const found = newestBinDir();
  if (found) return found;
  console.log("PostgreSQL server not found: installing Debian's postgresql package (needs root)…");
  run("apt-get", ["update", "-qq"]);
  run("apt-get", ["install", "-y", "-qq", "postgresql"]);
  const installed = newestBinDir();
  if (!installed) throw new Error("PostgreSQL was installed but no server binaries were found under /usr/lib/postgresql");
  return installed;
}

function newestBinDir(): string | null {
  const root = "/usr/lib/postgresql";
  if (!existsSync(root)) return null;
  const majors = readdirSync(root)
    .filter((v) => existsSync(join(root, v, "bin", "pg_ctl")))
    .sort((a, b) => Number(b) - Number(a));
  return majors.length ? join(root, majors[0], "bin") : null;
}

/** Creates the cluster once; later calls reuse it. */
export function ensureCluster({ dataDir }: ClusterOptions, binDir: string) {
  if (existsSync(join(dataDir, "PG_VERSION"))) return;
  mkdirSync(dataDir, { recursive: true });
  if (process.getuid?.() === 0) {
    // initdb refuses to run as root: the postgres OS user owns the data directory.
    const { uid, gid } = postgresIds();
    chownSync(dataDir, uid, gid);
  }
  run(join(binDir, "initdb"), ["-D", dataDir, "-U", "postgres", "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8"], {
    asPostgres: true,
    quiet: true,
  });
}

function postgresIds() {
  const uid = Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }).trim());
  const gid = Number(execFileSync("id", ["-g", "postgres"], { encoding: "utf8" }).trim());
  return { uid, gid };
}

export function isClusterRunning({ dataDir, port }: ClusterOptions, binDir: string): boolean {
  // pg_ctl refuses to run as root, so as root it runs as the cluster's owner. It checks that the
  // process in postmaster.pid is alive: a pid file left by a killed server does not count.
  const isRoot = process.getuid?.() === 0;
  const [file, argv] = isRoot
    ? ["runuser", ["-u", "postgres", "--", join(binDir, "pg_ctl"), "-D", dataDir, "status"]]
    : [join(binDir, "pg_ctl"), ["-D", dataDir, "status"]];
  const result = spawnSync(file, argv, { stdio: "pipe" });
  // pg_ctl status: 0 running, 3 not running, 4 no data directory.
  if (result.status === 0) return true;
  if (result.status === 3 || result.status === 4) return false;
  // Not allowed to look (another user's cluster): running only if the pid file exists and the port answers.
  return existsSync(join(dataDir, "postmaster.pid")) && portTaken(port);
}

export function startCluster(opts: ClusterOptions, binDir: string) {
  if (isClusterRunning(opts, binDir)) return false;
  if (portTaken(opts.port)) {
    throw new Error(
      `Port ${opts.port} is used by another program (another PostgreSQL?). Stop it, or choose another port (KITWRIGHT_PG_PORT / KITWRIGHT_TEST_PG_PORT).`,
    );
  }
  const serverOptions = `-c listen_addresses=127.0.0.1 -p ${opts.port} -c unix_socket_directories=${opts.dataDir} -c max_connections=200`;
  run(join(binDir, "pg_ctl"), ["-D", opts.dataDir, "-l", join(opts.dataDir, "server.log"), "-w", "-o", serverOptions, "start"], {
    asPostgres: true,
    quiet: true,
  });
  return true;
}

function portTaken(port: number) {
  // A synchronous probe: this runs before anything else is started.
  const probe = spawnSync(process.execPath, [
    "-e",
    `require("net").connect(${port}, "127.0.0.1").on("connect", () => process.exit(0)).on("error", () => process.exit(1))`,
  ]);
  return probe.status === 0;
}

export function stopCluster(opts: ClusterOptions, binDir: string) {
  if (!isClusterRunning(opts, binDir)) return;
  run(join(binDir, "pg_ctl"), ["-D", opts.dataDir, "-m", "fast", "-w", "stop"], { asPostgres: true, quiet: true });
}

export function clusterLogTail({ dataDir }: ClusterOptions, lines = 20): string {
  const log = join(dataDir, "server.log");
  return existsSync(log) ? readFileSync(log, "utf8").split("\n").slice(-lines).join("\n") : "";
}

export function adminUrl(port: number, database = "postgres") {
  return `postgres://postgres@127.0.0.1:${port}/${database}`;
}

/** Creates the database when missing; with `fresh`, drops it first. */
export async function ensureDatabase(port: number, name: string, { fresh = false } = {}) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`Unsafe database name: ${name}`);
  const client = new pg.Client({ connectionString: adminUrl(port) });
  await client.connect();
  try {
    if (fresh) await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    const { rowCount } = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [name]);
    if (!rowCount) await client.query(`CREATE DATABASE ${name}`);
  } finally {
    await client.end();
  }
}

export async function dropDatabase(port: number, name: string) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`Unsafe database name: ${name}`);
  const client = new pg.Client({ connectionString: adminUrl(port) });
  await client.connect();
  try {
    await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  } finally {
    await client.end();
  }
}

/** How many integration-test databases other runs still use (the cluster stays up for them). */
export async function otherTestDatabases(port: number) {
  const client = new pg.Client({ connectionString: adminUrl(port) });
  await client.connect();
  try {
    const { rows } = await client.query("SELECT count(*)::int AS n FROM pg_database WHERE datname LIKE 'kitwright\\_test\\_%'");
    return rows[0].n as number;
  } finally {
    await client.end();
  }
}
