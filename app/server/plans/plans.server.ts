// Kit plans and their revisions. Every query carries the acting team's id; saving a plan or a revision
// is one transaction, so a plan never exists without its snapshot.
import { sql } from "kysely";
import { db } from "../db.server";
import { isUuid } from "../modules.server";
import { planKit } from "~/domain/sizing/kit-plan";
import { PlanInputError } from "~/domain/sizing/plan-input";
import { blockingFailures } from "~/domain/sizing/checks";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import type { PlanChoices } from "~/lib/plan-choices";
import type { PlanOverrideJson } from "../db-schema-planning";

export type PlanOutcome = { ok: true; plan: KitPlan } | { ok: false; fields: Record<string, string> };

/** Runs the sizing; the domain's own input problems come back as field messages, never a 500. */
export function computePlan(input: KitPlanInput): PlanOutcome {
  try {
    return { ok: true, plan: planKit(input) };
  } catch (error) {
    if (!(error instanceof PlanInputError)) throw error;
    return { ok: false, fields: Object.fromEntries(error.issues.map((i) => [i.path, i.message])) };
  }
}

function failingSafety(plan: KitPlan) {
  return blockingFailures(plan.checks).length;
}

export async function createPlan(teamId: string, userId: string | null, choices: PlanChoices, input: KitPlanInput, plan: KitPlan) {
  return db.transaction().execute(async (trx) => {
    const row = await trx
      .insertInto("kit_plan")
      .values({ team_id: teamId, site_id: choices.siteId, load_sheet_id: choices.loadSheetId, name: choices.name, created_by: userId })
      .returning("id")
      .executeTakeFirstOrThrow();
    await trx
      .insertInto("kit_plan_revision")
      .values({
        plan_id: row.id,
        revision: 1,
        choices: JSON.stringify(choices),
        inputs: JSON.stringify(input),
        result: JSON.stringify(plan),
        failing_safety_checks: failingSafety(plan),
        note: "First plan.",
        created_by: userId,
      })
      .execute();
    return row.id;
  });
}

/** A new revision; the row lock on the plan keeps two simultaneous saves from taking one number. */
export async function addRevision(teamId: string, planId: string, userId: string, choices: PlanChoices, input: KitPlanInput, plan: KitPlan, note: string) {
  return db.transaction().execute(async (trx) => {
    const current = await trx
      .selectFrom("kit_plan")
      .select(["latest_revision"])
      .where("team_id", "=", teamId)
      .where("id", "=", planId)
      .forUpdate()
      .executeTakeFirst();
    if (!current) return null;
    const revision = current.latest_revision + 1;
    await trx
      .insertInto("kit_plan_revision")
      .values({
        plan_id: planId,
        revision,
        choices: JSON.stringify(choices),
        inputs: JSON.stringify(input),
        result: JSON.stringify(plan),
        failing_safety_checks: failingSafety(plan),
        note,
        created_by: userId,
      })
      .execute();
    await trx
      .updateTable("kit_plan")
      .set({ latest_revision: revision, name: choices.name, load_sheet_id: choices.loadSheetId, updated_at: new Date() })
      .where("id", "=", planId)
      .execute();
    return revision;
  });
}

export function listPlans(teamId: string) {
  return db
    .selectFrom("kit_plan")
    .innerJoin("kit_plan_revision as r", (j) => j.onRef("r.plan_id", "=", "kit_plan.id").onRef("r.revision", "=", "kit_plan.latest_revision"))
    .innerJoin("site", "site.id", "kit_plan.site_id")
    .select([
      "kit_plan.id",
      "kit_plan.name",
      "kit_plan.latest_revision",
      "kit_plan.updated_at",
      "site.name as siteName",
      "r.failing_safety_checks",
      "r.overrides",
      // Only the months whose sunshine was assumed (a sky preset), not the whole saved result.
      sql<{ month: number; irradianceSource: "clearness-index"; clearnessIndex: number }[]>`(
        select coalesce(jsonb_agg(m order by (m->>'month')::int), '[]'::jsonb)
        from jsonb_array_elements(r.result->'moduleYield'->'months') as m
        where m->>'irradianceSource' = 'clearness-index'
      )`.as("assumedSkyMonths"),
    ])
    .where("kit_plan.team_id", "=", teamId)
    .orderBy("kit_plan.updated_at", "desc")
    .execute();
}

export async function findPlan(teamId: string, planId: string, revision?: number) {
  if (!isUuid(planId)) return undefined;
  const plan = await db.selectFrom("kit_plan").selectAll().where("team_id", "=", teamId).where("id", "=", planId).executeTakeFirst();
  if (!plan) return undefined;
  const wanted = revision ?? plan.latest_revision;
  const rev = await db.selectFrom("kit_plan_revision").selectAll().where("plan_id", "=", plan.id).where("revision", "=", wanted).executeTakeFirst();
  if (!rev) return undefined;
  const history = await db
    .selectFrom("kit_plan_revision")
    .leftJoin("user", "user.id", "kit_plan_revision.created_by")
    .select([
      "kit_plan_revision.revision",
      "kit_plan_revision.note",
      "kit_plan_revision.created_at",
      "kit_plan_revision.failing_safety_checks",
      "user.name as byName",
    ])
    .where("plan_id", "=", plan.id)
    .orderBy("revision", "desc")
    .execute();
  return { plan, revision: rev, history };
}

/** Records overrides of failing safety checks on the plan's latest revision. */
export async function saveOverrides(teamId: string, planId: string, overrides: PlanOverrideJson[]) {
  return db.transaction().execute(async (trx) => {
    const plan = await trx
      .selectFrom("kit_plan")
      .select(["latest_revision"])
      .where("team_id", "=", teamId)
      .where("id", "=", planId)
      .forUpdate()
      .executeTakeFirst();
    if (!plan) return false;
    await trx
      .updateTable("kit_plan_revision")
      .set({ overrides: JSON.stringify(overrides) })
      .where("plan_id", "=", planId)
      .where("revision", "=", plan.latest_revision)
      .execute();
    return true;
  });
}
