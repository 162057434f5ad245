// Ports and folders of the test run: separate from `npm start`'s so both can run side by side.
import type { ClusterOptions } from "../../scripts/lib/postgres-cluster";
import type { ServicePorts } from "../../scripts/lib/services";

export const TEST_PG_PORT = Number(process.env.KITWRIGHT_TEST_PG_PORT ?? 54330);
export const TEST_CLUSTER: ClusterOptions = {
  port: TEST_PG_PORT,
  dataDir: process.env.KITWRIGHT_TEST_PGDATA ?? `/var/tmp/kitwright-pg-test-${TEST_PG_PORT}`,
};
/** Integration tests (Vitest, in-process) use this database; browser tests use E2E_DATABASE. */
export const INTEGRATION_DATABASE = "kitwright_test";
export const E2E_DATABASE = "kitwright_e2e";
export const databaseUrl = (name: string) => `postgres://postgres@127.0.0.1:${TEST_PG_PORT}/${name}`;

export const E2E_PORTS: ServicePorts = { app: 3310, smtp: 2625, mailHttp: 2680, payments: 12211 };
