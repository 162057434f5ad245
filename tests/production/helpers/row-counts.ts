// Row counts of every table in the public schema, in one statement, to show that a refused request
// wrote nothing (or only to the append-only tables a test names and justifies).
import pg from "pg";

export type RowCounts = Record<string, number>;

export async function openDatabase(databaseUrl: string) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  const { rows } = await client.query<{ table_name: string }>(
    "select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name",
  );
  const tables = rows.map((r) => r.table_name);
  const countSql = tables.map((t) => `select ${pg.escapeLiteral(t)} as t, count(*)::int as n from ${pg.escapeIdentifier(t)}`).join(" union all ");

  async function rowCounts(): Promise<RowCounts> {
    const result = await client.query<{ t: string; n: number }>(countSql);
    return Object.fromEntries(result.rows.map((r) => [r.t, r.n]));
  }

  return { client, tables, rowCounts, close: () => client.end() };
}

/** Tables whose count changed, as "table before→after". */
export function changedTables(before: RowCounts, after: RowCounts, allowed: ReadonlySet<string> = new Set()) {
  return Object.keys({ ...before, ...after })
    .filter((t) => !allowed.has(t) && before[t] !== after[t])
    .map((t) => `${t} ${before[t]}→${after[t]}`);
}
