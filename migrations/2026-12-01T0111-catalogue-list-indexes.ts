// Indexes for the catalogue list at thousands of modules (measured with `npm run bench`):
// - search: every word typed must appear in "maker model"; a stored lower-case copy lets the query
//   use LIKE (case folding per row made ILIKE the slowest part) and a trigram index answers
//   selective words without reading every module. pg_trgm ships with PostgreSQL and is a trusted
//   extension (PostgreSQL 13+), so the database owner may create it.
// - totals: the list answers how many modules match as well as one page of them; narrow indexes
//   holding the filtered columns let PostgreSQL count from the index alone (an index-only scan)
//   instead of reading each module's whole row.
// - sorts: verified figures are null until a module has readings and the list puts those last
//   either way; a descending sort with NULLS LAST cannot walk the ascending index backwards, so the
//   columns sorted "best first" get a descending index of their own.
// Every list hides merged duplicates, so these indexes cover only models that were not merged.
import { sql, type Kysely } from "kysely";

const DESCENDING = ["verified_ratio", "measured_density_wm2", "verified_pmax_w"];

export async function up(db: Kysely<any>) {
  await sql`create extension if not exists pg_trgm`.execute(db);
  await sql`alter table pv_module add column search_text text generated always as (lower(maker || ' ' || model)) stored`.execute(db);
  await sql`create index pv_module_search_text_trgm_idx on pv_module using gin (search_text gin_trgm_ops)`.execute(db);
  await sql`create index pv_module_list_filter_idx on pv_module (cell_technology, pmax_w)
    include (verified_reading_count, verified_ratio) where merged_into is null`.execute(db);
  for (const column of DESCENDING) {
    await sql`create index ${sql.id(`pv_module_${column}_desc_idx`)} on pv_module (${sql.id(column)} desc nulls last) where merged_into is null`.execute(db);
  }
}

export async function down(db: Kysely<any>) {
  for (const column of DESCENDING) await sql`drop index ${sql.id(`pv_module_${column}_desc_idx`)}`.execute(db);
  await sql`drop index pv_module_list_filter_idx`.execute(db);
  await sql`drop index pv_module_search_text_trgm_idx`.execute(db);
  await sql`alter table pv_module drop column search_text`.execute(db);
}
