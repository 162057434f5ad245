// npm run db:restore -- <file> [--to <database URL>] [--force]
// Restores a `npm run db:backup` file into the database at --to (default DATABASE_URL, else the
// `npm start` database), creating it when missing. A database that already holds tables is left
// alone unless --force, which drops and recreates it first (ending its connections). The restore is
// one transaction: it either completes or leaves the new database empty.
import { existsSync } from "node:fs";
import { DEV_DATABASE_URL } from "./lib/dev-cluster";
import { createDatabase, databaseExists, databaseName, redactUrl, runPgTool, userTableCount } from "./lib/pg-tools";

function usage(message: string): never {
  console.error(`${message}\nUsage: npm run db:restore -- <backup file> [--to <database URL>] [--force]`);
  process.exit(2);
}

let force = false;
let toArg: string | null = null;
const positional: string[] = [];
const args = process.argv.slice(2);
for (let i = 0; i < args.length; i++) {
  if (args[i] === "--force") force = true;
  else if (args[i] === "--to") toArg = args[++i] ?? usage("--to needs a database URL.");
  else if (args[i].startsWith("--to=")) toArg = args[i].slice("--to=".length);
  else if (args[i].startsWith("--")) usage(`Unknown option ${args[i]}.`);
  else positional.push(args[i]);
}
const file = positional[0] ?? usage("Which backup file?");
const url = toArg ?? process.env.DATABASE_URL ?? DEV_DATABASE_URL;
if (!url.startsWith("postgres")) usage(`Not a PostgreSQL URL: ${url}`);
if (!existsSync(file)) usage(`No such file: ${file}`);
// pg_restore --list reads the table of contents: a quick check that this is a custom-format dump.
if (runPgTool("pg_restore", ["--list", file], { quiet: true }) !== 0) usage(`${file} is not a pg_dump custom-format backup.`);

const name = databaseName(url);
if (!(await databaseExists(url))) {
  await createDatabase(url);
} else {
  const tables = await userTableCount(url);
  if (tables > 0 && !force) {
    console.error(
      `Database ${name} already holds ${tables} tables: not overwriting it. Restore into a new database (--to <URL>), or add --force to drop and replace ${name}.`,
    );
    process.exit(1);
  }
  if (tables > 0) await createDatabase(url, { replace: true });
}

const started = Date.now();
const status = runPgTool("pg_restore", ["--exit-on-error", "--single-transaction", "--no-owner", "--no-privileges", `--dbname=${url}`, file]);
if (status !== 0) {
  console.error(`Restore into ${redactUrl(url)} failed (pg_restore exit status ${status}); the transaction was rolled back.`);
  process.exit(1);
}
console.log(`Restored ${file} into database ${name} (${await userTableCount(url)} tables, ${((Date.now() - started) / 1000).toFixed(1)} s).`);
