// Where `npm start` keeps its PostgreSQL: outside the repo by default, configurable.
import type { ClusterOptions } from "./postgres-cluster";

export const DEV_PG_PORT = Number(process.env.KITWRIGHT_PG_PORT ?? 54320);
export const DEV_CLUSTER: ClusterOptions = {
  port: DEV_PG_PORT,
  dataDir: process.env.KITWRIGHT_PGDATA ?? `/var/tmp/kitwright-pg-${DEV_PG_PORT}`,
};
export const DEV_DATABASE = "kitwright";
export const DEV_DATABASE_URL = `postgres://postgres@127.0.0.1:${DEV_PG_PORT}/${DEV_DATABASE}`;
