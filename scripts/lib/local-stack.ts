// The local stack shared by `npm start` and `npm run dev`: a lock against a second copy, the project's
// own PostgreSQL, migrations, demo data on an empty database, and the fakes. Ctrl-C, SIGTERM, SIGHUP
// (the terminal closed) or the end of the process that started it stops it all.
import { DEV_CLUSTER, DEV_DATABASE, DEV_DATABASE_URL } from "./dev-cluster";
import { migrateToLatest } from "./migrator";
import { watchLaunchers } from "./parent-watch";
import { ensureCluster, ensureDatabase, findPostgresBinDir, isClusterRunning, startCluster, stopCluster } from "./postgres-cluster";
import { stopAll } from "./processes";
import { appEnv, startFakes, type ServicePorts } from "./services";
import { seedIfEmpty } from "./seed-demo";
import { busyPorts, busyPortsMessage, otherStarts, removeLock, runningStart, claimLock } from "./start-lock";

export const LOCAL_PORTS: ServicePorts = {
  app: Number(process.env.PORT ?? 3000),
  smtp: Number(process.env.MAIL_SMTP_PORT ?? 2525),
  mailHttp: Number(process.env.MAIL_HTTP_PORT ?? 2580),
  payments: Number(process.env.PAYMENTS_PORT ?? 12111),
};

export async function bootLocalStack(ports: ServicePorts = LOCAL_PORTS) {
  function refuseSecondCopy(running: { pid: number }): never {
    console.error(
      `Kitwright is already running (process ${running.pid}) at http://127.0.0.1:${ports.app}. Stop it with Ctrl-C in its terminal. ` +
        "To run a second copy, give it its own PORT, MAIL_SMTP_PORT, MAIL_HTTP_PORT, PAYMENTS_PORT, KITWRIGHT_PG_PORT and KITWRIGHT_PGDATA (see .env.example).",
    );
    process.exit(1);
  }
  const running = runningStart(ports.app);
  if (running) refuseSecondCopy(running);
  const binDir = findPostgresBinDir();
  const others = otherStarts();
  const busy = await busyPorts(ports, DEV_CLUSTER.port, others, () => isClusterRunning(DEV_CLUSTER, binDir));
  if (busy.length) {
    console.error(busyPortsMessage(busy, others));
    process.exit(1);
  }
  const holder = claimLock(ports, DEV_CLUSTER.port);
  if (holder) refuseSecondCopy(holder);

  ensureCluster(DEV_CLUSTER, binDir);
  let startedPostgres = false;
  let stopping = false;
  function shutdown(code = 0, why = "") {
    if (stopping) return;
    stopping = true;
    // After SIGHUP the terminal may be gone: a failed write must not stop the clean-up.
    for (const stream of [process.stdout, process.stderr]) stream.on("error", () => {});
    try {
      console.log(`\nStopping Kitwright${why ? ` (${why})` : ""}…`);
    } catch {}
    try {
      stopAll();
      if (startedPostgres) stopCluster(DEV_CLUSTER, binDir);
    } finally {
      removeLock(ports.app);
      process.exit(code);
    }
  }
  process.on("SIGINT", () => shutdown(0));
  process.on("SIGTERM", () => shutdown(0, "SIGTERM"));
  process.on("SIGHUP", () => shutdown(0, "SIGHUP: the terminal closed"));
  watchLaunchers((why) => shutdown(0, why));

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
