// One shared pg pool and one Kysely instance for the whole process (better-auth uses the same pool).
import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import { env } from "./env.server";
import type { Database } from "./db-schema";

// numeric stays a string (decimal.js parses it); bigint counts become numbers.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));

export const pool = new pg.Pool({
  connectionString: env.DATABASE_URL,
  max: env.DATABASE_POOL_MAX,
  connectionTimeoutMillis: 3000,
  idleTimeoutMillis: 30000,
});

// Without a listener, an idle client dropped by a PostgreSQL restart kills the process.
pool.on("error", (error) => {
  console.error(JSON.stringify({ level: "error", msg: "idle database client failed", error: error.message }));
});
// The same for a client that is checked out but between queries (inside a transaction, waiting on the
// app) when the server ends its connection: the query that follows fails and is answered 503; the
// event itself must not kill the process.
pool.on("connect", (client) => {
  client.on("error", (error) => {
    console.error(JSON.stringify({ level: "error", msg: "database connection ended while in use", error: error.message }));
  });
});

export const db = new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
