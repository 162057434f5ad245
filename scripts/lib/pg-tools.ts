// pg_dump / pg_restore from the same PostgreSQL installation that runs the project's clusters (a
// dump is readable by the same or a newer major), and the few catalogue questions the backup and
// restore commands ask.
import { spawnSync } from "node:child_process";
import { join } from "node:path";
import pg from "pg";
import { findPostgresBinDir } from "./postgres-cluster";

/** Runs pg_dump or pg_restore, its messages passed through (`quiet`: its output dropped); returns the exit status. */
export function runPgTool(tool: "pg_dump" | "pg_restore", args: string[], { quiet = false } = {}) {
  const result = spawnSync(join(findPostgresBinDir(), tool), args, { stdio: ["ignore", quiet ? "ignore" : "inherit", "inherit"] });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

export function databaseName(url: string) {
  const name = decodeURIComponent(new URL(url).pathname.replace(/^\//, ""));
  if (!name) throw new Error(`No database name in ${redactUrl(url)}`);
  return name;
}

/** The URL without its password, for messages. */
export function redactUrl(url: string) {
  const parsed = new URL(url);
  if (parsed.password) parsed.password = "***";
  return parsed.toString();
}

function withDatabase(url: string, name: string) {
  const parsed = new URL(url);
  parsed.pathname = `/${encodeURIComponent(name)}`;
  return parsed.toString();
}

async function query<T extends pg.QueryResultRow>(url: string, text: string, values: unknown[] = []) {
  const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 5000 });
  await client.connect();
  try {
    return (await client.query<T>(text, values)).rows;
  } finally {
    await client.end();
  }
}

export async function databaseExists(url: string) {
  const rows = await query(withDatabase(url, "postgres"), "select 1 from pg_database where datname = $1", [databaseName(url)]);
  return rows.length > 0;
}

/** Tables outside PostgreSQL's own schemas: a database with any is not empty. */
export async function userTableCount(url: string) {
  const rows = await query<{ n: number }>(url, "select count(*)::int as n from pg_tables where schemaname not in ('pg_catalog', 'information_schema')");
  return rows[0].n;
}

/** Creates the database empty; `replace` drops it first, ending every connection to it. */
export async function createDatabase(url: string, { replace = false } = {}) {
  const ident = `"${databaseName(url).replace(/"/g, '""')}"`;
  const admin = withDatabase(url, "postgres");
  if (replace) await query(admin, `drop database if exists ${ident} with (force)`);
  await query(admin, `create database ${ident}`);
}
