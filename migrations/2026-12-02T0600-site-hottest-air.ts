// A site's hottest expected air temperature (a design high: the hottest afternoon the installer plans
// for), used by the kit plan's hot-afternoon string voltage check in place of the hottest month's mean
// daily maximum. Nullable: sites saved before this, and sites whose installer leaves it blank, keep
// the monthly figure. The range is the site form's (−40…60 °C).
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .alterTable("site")
    .addColumn("hottest_temp_c", "double precision", (c) => c.check(sql`hottest_temp_c between -40 and 60`))
    .execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.alterTable("site").dropColumn("hottest_temp_c").execute();
}
