// npm run db:backup [-- <file>] — a consistent snapshot of DATABASE_URL (default: the `npm start`
// database) in pg_dump's custom format, by default into backups/kitwright-<UTC time>.dump (ignored by
// git). The dump is written beside the target and renamed at the end, so an interrupted backup never
// leaves a file that looks complete. Restore it with `npm run db:restore -- <file>`.
import { mkdirSync, renameSync, rmSync, statSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { DEV_DATABASE_URL } from "./lib/dev-cluster";
import { databaseName, redactUrl, runPgTool } from "./lib/pg-tools";

const url = process.env.DATABASE_URL ?? DEV_DATABASE_URL;
const stamp = new Date()
  .toISOString()
  .replace(/[-:]/g, "")
  .replace(/\.\d+Z$/, "Z");
const file = resolve(process.argv[2] ?? `backups/kitwright-${stamp}.dump`);
const partial = `${file}.partial`;

mkdirSync(dirname(file), { recursive: true });
const started = Date.now();
const status = runPgTool("pg_dump", ["--format=custom", "--compress=6", `--file=${partial}`, `--dbname=${url}`]);
if (status !== 0) {
  rmSync(partial, { force: true });
  console.error(`Backup of ${redactUrl(url)} failed (pg_dump exit status ${status}); nothing was written.`);
  process.exit(1);
}
renameSync(partial, file);
const sizeMb = statSync(file).size / 1e6;
console.log(`Backed up database ${databaseName(url)} to ${file} (${sizeMb.toFixed(2)} MB in ${((Date.now() - started) / 1000).toFixed(1)} s).`);
