// Kit plans and their revisions. A revision keeps a snapshot of every input (site, loads, parts'
// figures, design choices) and the computed result, so a later catalogue or site change never
// silently alters a saved plan; re-planning makes a new revision and keeps the old ones.
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("kit_plan")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("site_id", "uuid", (c) => c.notNull().references("site.id").onDelete("cascade"))
    .addColumn("load_sheet_id", "uuid", (c) => c.references("load_sheet.id").onDelete("set null"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("latest_revision", "integer", (c) => c.notNull().defaultTo(1))
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("kit_plan_team_idx").on("kit_plan").columns(["team_id", "updated_at"]).execute();

  await db.schema
    .createTable("kit_plan_revision")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("plan_id", "uuid", (c) => c.notNull().references("kit_plan.id").onDelete("cascade"))
    .addColumn("revision", "integer", (c) => c.notNull())
    // { moduleId, controllerId, batteryId, inverterId | null, systemVoltageV, design }
    .addColumn("choices", "jsonb", (c) => c.notNull())
    // The domain's KitPlanInput with every figure copied in (the snapshot).
    .addColumn("inputs", "jsonb", (c) => c.notNull())
    // The domain's KitPlan.
    .addColumn("result", "jsonb", (c) => c.notNull())
    .addColumn("failing_safety_checks", "integer", (c) => c.notNull())
    // Failing safety checks accepted anyway, each with its reason: [{ checkId, reason, byUserId, byName, at }].
    .addColumn("overrides", "jsonb", (c) => c.notNull().defaultTo(sql`'[]'::jsonb`))
    .addColumn("note", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("kit_plan_revision_plan_revision_key", ["plan_id", "revision"])
    .execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.dropTable("kit_plan_revision").execute();
  await db.schema.dropTable("kit_plan").execute();
}
