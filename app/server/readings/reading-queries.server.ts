// Reading queries. Team data is filtered by the viewer's team in SQL, never after the fact.
import { sql } from "kysely";
import { db } from "../db.server";
import { isUuid, type ReadingViewer } from "./reading-viewer.server";

export type ReadingStatus = "pending" | "approved" | "rejected";
export const READING_STATUSES: ReadingStatus[] = ["pending", "approved", "rejected"];

/** Modules a reading can be submitted for: the live catalogue (merged duplicates left out). */
export async function listReadableModules() {
  return db
    .selectFrom("pv_module")
    .select(["id", "maker", "model", "pmax_w", "gamma_pmax_pct_per_c", "noct_c", "cell_technology"])
    .where("merged_into", "is", null)
    .orderBy("maker")
    .orderBy("model")
    .limit(1000)
    .execute();
}

export async function findReadableModule(id: string) {
  if (!isUuid(id)) return undefined;
  return db
    .selectFrom("pv_module")
    .select(["id", "maker", "model", "pmax_w", "gamma_pmax_pct_per_c", "noct_c", "merged_into"])
    .where("id", "=", id)
    .executeTakeFirst();
}

function summaryQuery() {
  return db
    .selectFrom("field_reading as r")
    .innerJoin("pv_module as m", "m.id", "r.module_id")
    .leftJoin("user as u", "u.id", "r.submitted_by")
    .leftJoin("organization as o", "o.id", "r.team_id")
    .select([
      "r.id",
      "r.status",
      "r.kind",
      "r.module_id as moduleId",
      "m.maker",
      "m.model",
      "m.pmax_w as nameplatePmaxW",
      "r.measured_pmax_w as measuredPmaxW",
      "r.stc_pmax_w as stcPmaxW",
      "r.uncertainty_pct as uncertaintyPct",
      "r.weight",
      "r.irradiance_source as irradianceSource",
      "r.flags",
      "r.taken_at as takenAt",
      "r.utc_offset_min as utcOffsetMin",
      "r.created_at as createdAt",
      "u.name as submitterName",
      "o.name as teamName",
    ]);
}

export async function listReadings(viewer: ReadingViewer, { status, limit, offset }: { status: ReadingStatus | null; limit: number; offset: number }) {
  let query = summaryQuery();
  if (!viewer.seesAll) query = query.where("r.team_id", "=", viewer.teamId ?? "");
  if (status) query = query.where("r.status", "=", status);
  const count = db.selectFrom("field_reading as r").select((eb) => eb.fn.countAll<number>().as("count"));
  const counted = status ? count.where("r.status", "=", status) : count;
  const [items, total] = await Promise.all([
    query.orderBy("r.created_at", "desc").orderBy("r.id").limit(limit).offset(offset).execute(),
    (viewer.seesAll ? counted : counted.where("r.team_id", "=", viewer.teamId ?? "")).executeTakeFirstOrThrow(),
  ]);
  return { items, total: Number(total.count) };
}

export async function findReadingForViewer(viewer: ReadingViewer, id: string) {
  if (!isUuid(id)) return undefined;
  let query = db
    .selectFrom("field_reading as r")
    .innerJoin("pv_module as m", "m.id", "r.module_id")
    .leftJoin("user as u", "u.id", "r.submitted_by")
    .leftJoin("organization as o", "o.id", "r.team_id")
    .selectAll("r")
    .select([
      "m.maker",
      "m.model",
      "m.pmax_w as nameplatePmaxW",
      "m.verified_pmax_w as verifiedPmaxW",
      "m.verified_reading_count as verifiedReadingCount",
      "u.name as submitterName",
      "o.name as teamName",
    ])
    .where("r.id", "=", id);
  if (!viewer.seesAll) query = query.where("r.team_id", "=", viewer.teamId ?? "");
  return query.executeTakeFirst();
}

export async function listDecisions(readingId: string) {
  return db
    .selectFrom("reading_decision as d")
    .leftJoin("user as u", "u.id", "d.decided_by")
    .select(["d.id", "d.decision", "d.reason", "d.decided_at as decidedAt", "u.name as curatorName"])
    .where("d.reading_id", "=", readingId)
    .orderBy("d.decided_at")
    .orderBy("d.id")
    .execute();
}

/** STC values of each module's approved readings (the reference for the outlier score). */
export async function approvedValuesByModule(moduleIds: string[], excludeReadingIds: string[] = []) {
  const byModule = new Map<string, number[]>();
  if (moduleIds.length === 0) return byModule;
  let query = db.selectFrom("field_reading").select(["module_id", "stc_pmax_w"]).where("status", "=", "approved").where("module_id", "in", moduleIds);
  if (excludeReadingIds.length) query = query.where("id", "not in", excludeReadingIds);
  for (const row of await query.execute()) {
    const list = byModule.get(row.module_id) ?? [];
    list.push(row.stc_pmax_w);
    byModule.set(row.module_id, list);
  }
  return byModule;
}

/** The curator's queue: pending readings, oldest first. */
export async function listPendingQueue({ limit, offset }: { limit: number; offset: number }) {
  const [items, total] = await Promise.all([
    summaryQuery()
      .select([
        "r.sweep",
        "r.photo_id as photoId",
        "r.measured_vmp_v as vmpV",
        "r.measured_imp_a as impA",
        "r.irradiance_wm2 as irradianceWm2",
        "r.cell_temp_c as cellTempC",
        "r.module_temp_c as moduleTempC",
      ])
      .where("r.status", "=", "pending")
      .orderBy("r.created_at")
      .orderBy("r.id")
      .limit(limit)
      .offset(offset)
      .execute(),
    db
      .selectFrom("field_reading")
      .select((eb) => eb.fn.countAll<number>().as("count"))
      .where("status", "=", "pending")
      .executeTakeFirstOrThrow(),
  ]);
  return { items, total: Number(total.count) };
}

/** The latest decisions, for the curator's "recently decided" list. */
export async function listRecentDecisions(limit: number) {
  return db
    .selectFrom("reading_decision as d")
    .innerJoin("field_reading as r", "r.id", "d.reading_id")
    .innerJoin("pv_module as m", "m.id", "r.module_id")
    .leftJoin("user as u", "u.id", "d.decided_by")
    .select([
      "d.id",
      "d.decision",
      "d.reason",
      "d.decided_at as decidedAt",
      "r.id as readingId",
      "m.maker",
      "m.model",
      "r.stc_pmax_w as stcPmaxW",
      "u.name as curatorName",
    ])
    .orderBy("d.decided_at", "desc")
    .orderBy(sql`d.id`)
    .limit(limit)
    .execute();
}
