// Vitest global setup for integration tests: a fresh database on the test cluster (started here when
// it is not running), all migrations applied, and the mail fake listening. Workers inherit the env.
import {
  dropDatabase,
  ensureCluster,
  ensureDatabase,
  findPostgresBinDir,
  otherTestDatabases,
  startCluster,
  stopCluster,
} from "../../scripts/lib/postgres-cluster";
import { execFileSync } from "node:child_process";
import { startMailFake } from "../../fakes/mail-server";
import { DEFAULT_WEBHOOK_SECRET, startPaymentsFake } from "../../fakes/payments-server";
import { databaseUrl, INTEGRATION_DATABASE, TEST_CLUSTER } from "./test-env";

export default async function setup() {
  const binDir = findPostgresBinDir();
  ensureCluster(TEST_CLUSTER, binDir);
  const startedHere = startCluster(TEST_CLUSTER, binDir);
  // One database per run, so that two runs on one machine never drop each other's data.
  const database = `${INTEGRATION_DATABASE}_${process.pid}`;
  await ensureDatabase(TEST_CLUSTER.port, database, { fresh: true });
  const url = databaseUrl(database);
  // Migrations are TypeScript files: run them through tsx (Vitest's setup loads modules natively).
  execFileSync("node_modules/.bin/tsx", ["scripts/migrate.ts"], { env: { ...process.env, DATABASE_URL: url }, stdio: ["ignore", "ignore", "inherit"] });
  // Free ports chosen by the system, so that several runs on one machine never collide.
  const mail = await startMailFake({ smtpPort: 0, httpPort: 0, log: () => {} });
  // Records events without delivering them: tests post them to the webhook action themselves.
  const payments = await startPaymentsFake({ port: 0, log: () => {} });

  Object.assign(process.env, {
    NODE_ENV: "test",
    DATABASE_URL: url,
    PUBLIC_URL: "http://127.0.0.1:3999",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(mail.smtpPort),
    MAIL_FAKE_URL: mail.url,
    ENABLE_DEV_OUTBOX: "true",
    STRIPE_SECRET_KEY: "sk_test_integration",
    STRIPE_API_URL: payments.url,
    STRIPE_WEBHOOK_SECRET: DEFAULT_WEBHOOK_SECRET,
  });

  return async () => {
    await mail.close();
    await payments.close();
    if (process.env.KITWRIGHT_KEEP_TEST_DB) return;
    await dropDatabase(TEST_CLUSTER.port, database);
    if (startedHere && (await otherTestDatabases(TEST_CLUSTER.port)) === 0) stopCluster(TEST_CLUSTER, binDir);
  };
}
