// A module's nominal operating temperature is given either as NOCT (open circuit, older IEC 61215
// editions) or as NMOT (at maximum power, IEC 61215:2016); the catalogue records which one it is.
// Rows from before this migration carry NOCT, the only kind the catalogue accepted until now.
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .alterTable("pv_module")
    .addColumn("nominal_temp_kind", "text", (c) =>
      c
        .notNull()
        .defaultTo("noct")
        .check(sql`nominal_temp_kind in ('noct', 'nmot')`),
    )
    .execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.alterTable("pv_module").dropColumn("nominal_temp_kind").execute();
}
