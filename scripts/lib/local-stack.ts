// The local stack shared by `npm start` and `npm run dev`: a lock against a second copy, the project's
// own PostgreSQL, migrations, demo data on an empty database, and the fakes. Ctrl-C stops it all.
import { existsSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { DEV_CLUSTER, DEV_DATABASE, DEV_DATABASE_URL } from "./dev-cluster";
import { migrateToLatest } from "./migrator";
import { ensureCluster, ensureDatabase, findPostgresBinDir, startCluster, stopCluster } from "./postgres-cluster";
import { isPortInUse, stopAll } from "./processes";
import { appEnv, startFakes, type ServicePorts } from "./services";
import { seedIfEmpty } from "./seed-demo";

export const LOCAL_PORTS: ServicePorts = {
  app: Number(process.env.PORT ?? 3000),
  smtp: Number(process.env.MAIL_SMTP_PORT ?? 2525),
  mailHttp: Number(process.env.MAIL_HTTP_PORT ?? 2580),
  payments: Number(process.env.PAYMENTS_PORT ?? 12111),
};

function runningPid(lockFile: string): number | null {
  if (!existsSync(lockFile)) return null;
  const pid = Number(readFileSync(lockFile, "utf8"));
  try {
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

export async function bootLocalStack(ports: ServicePorts = LOCAL_PORTS) {
  const lockFile = `/var/tmp/kitwright-start-${ports.app}.pid`;
  const pid = runningPid(lockFile);
  if (pid) {
    console.error(
      `Kitwright is already running (process ${pid}) at http://127.0.0.1:${ports.app}. Stop it with Ctrl-C in its terminal, or choose another PORT.`,
    );
    process.exit(1);
  }
  for (const [name, port] of Object.entries(ports)) {
    if (await isPortInUse(port)) {
      console.error(
        `Port ${port} (${name}) is already in use: is another Kitwright or another program running? Stop it or set another port (see .env.example).`,
      );
      process.exit(1);
    }
  }
  writeFileSync(lockFile, String(process.pid));

  const binDir = findPostgresBinDir();
  ensureCluster(DEV_CLUSTER, binDir);
  let startedPostgres = false;
  let stopping = false;
  function shutdown(code = 0) {
    if (stopping) return;
    stopping = true;
    console.log("\nStopping Kitwright…");
    stopAll();
    if (startedPostgres) stopCluster(DEV_CLUSTER, binDir);
    rmSync(lockFile, { force: true });
    process.exit(code);
  }
  process.on("SIGINT", () => shutdown(0));
  process.on("SIGTERM", () => shutdown(0));

  try {
    startedPostgres = startCluster(DEV_CLUSTER, binDir);
    await ensureDatabase(DEV_CLUSTER.port, DEV_DATABASE);
    await migrateToLatest(DEV_DATABASE_URL, () => {});
    const env = appEnv(ports, DEV_DATABASE_URL);
    Object.assign(process.env, env);
    const seeded = await seedIfEmpty();
    await startFakes(env, ports);
    return { env, seeded, shutdown, isStopping: () => stopping };
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    shutdown(1);
    throw error;
  }
}

export function banner(ports: ServicePorts, seeded: boolean, demoLines: string[]) {
  return `
Kitwright is running.
  App             http://127.0.0.1:${ports.app}
  Outbox (fake)   http://127.0.0.1:${ports.app}/dev/outbox   (every e-mail the app sends)
  Payments (fake) http://127.0.0.1:${ports.payments}   (test cards: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined)
  PostgreSQL      ${DEV_DATABASE_URL}   (data in ${DEV_CLUSTER.dataDir})
${seeded ? "  Demo data loaded into the empty database." : "  Existing data kept."}
Demo sign-ins:
${demoLines.join("\n")}
Press Ctrl-C to stop everything.`;
}
