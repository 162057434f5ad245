// Curators' decisions on field readings. Each decision is kept (who, when, why); the module's
// verified figures are recomputed in the same transaction as the status change, and the submitter
// is told by e-mail once the transaction has committed.
import { recomputeVerifiedFigures } from "../catalogue/verified-figures.server";
import { db } from "../db.server";
import { env } from "../env.server";
import { sendMail } from "../mail.server";
import type { ReadingStatus } from "./reading-queries.server";

export type Decision = "approved" | "rejected";

export interface DecisionRequest {
  curatorId: string;
  readingIds: string[];
  decision: Decision;
  reason: string;
  /** From the queue: only pending readings are decided (another curator may have been quicker). */
  onlyPending: boolean;
}

export interface DecisionOutcome {
  decided: { id: string; moduleId: string }[];
  skipped: { id: string; status: ReadingStatus | "missing" }[];
}

export async function decideReadings(request: DecisionRequest): Promise<DecisionOutcome> {
  const ids = [...new Set(request.readingIds)];
  const outcome = await db.transaction().execute(async (trx) => {
    // Lock the rows so two curators deciding at once cannot both win.
    const rows = await trx.selectFrom("field_reading").select(["id", "module_id", "status"]).where("id", "in", ids).orderBy("id").forUpdate().execute();
    const decided: DecisionOutcome["decided"] = [];
    const skipped: DecisionOutcome["skipped"] = ids.filter((id) => !rows.some((r) => r.id === id)).map((id) => ({ id, status: "missing" as const }));
    const touchedModules = new Set<string>();
    for (const row of rows) {
      if (row.status === request.decision || (request.onlyPending && row.status !== "pending")) {
        skipped.push({ id: row.id, status: row.status });
        continue;
      }
      await trx.updateTable("field_reading").set({ status: request.decision }).where("id", "=", row.id).execute();
      await trx
        .insertInto("reading_decision")
        .values({ reading_id: row.id, decided_by: request.curatorId, decision: request.decision, reason: request.reason })
        .execute();
      // Verified figures change only when an approved reading enters or leaves the set.
      if (request.decision === "approved" || row.status === "approved") touchedModules.add(row.module_id);
      decided.push({ id: row.id, moduleId: row.module_id });
    }
    for (const moduleId of touchedModules) await recomputeVerifiedFigures(trx, moduleId);
    return { decided, skipped };
  });
  await notifySubmitters(
    outcome.decided.map((d) => d.id),
    request.decision,
    request.reason,
  );
  return outcome;
}

async function notifySubmitters(readingIds: string[], decision: Decision, reason: string) {
  if (readingIds.length === 0) return;
  const rows = await db
    .selectFrom("field_reading as r")
    .innerJoin("pv_module as m", "m.id", "r.module_id")
    .innerJoin("user as u", "u.id", "r.submitted_by")
    .select(["r.id", "r.stc_pmax_w", "r.taken_at", "m.maker", "m.model", "u.email", "u.name"])
    .where("r.id", "in", readingIds)
    .execute();
  for (const row of rows) {
    const module = `${row.maker} ${row.model}`;
    const url = new URL(`/readings/${row.id}`, env.PUBLIC_URL).toString();
    const taken = new Date(row.taken_at).toISOString().slice(0, 10);
    try {
      await sendMail({
        to: row.email,
        subject: decision === "approved" ? `Your field reading of the ${module} is approved` : `Your field reading of the ${module} was not accepted`,
        paragraphs: [
          `Hello ${row.name},`,
          decision === "approved"
            ? `The curator approved your reading of the ${module} taken on ${taken} (${row.stc_pmax_w.toFixed(1)} W at STC). It now counts towards the module's verified power.`
            : `The curator did not accept your reading of the ${module} taken on ${taken} (${row.stc_pmax_w.toFixed(1)} W at STC). It does not count towards the module's verified power.`,
          `Reason: ${reason}`,
        ],
        action: { label: "Open the reading", url },
      });
    } catch (error) {
      // The decision is committed; a mail failure must not undo it or hide it from the curator.
      console.error(
        JSON.stringify({
          level: "error",
          msg: "reading decision mail failed",
          readingId: row.id,
          error: error instanceof Error ? error.message : String(error),
        }),
      );
    }
  }
}
