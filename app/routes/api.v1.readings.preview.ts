// POST /api/v1/readings/preview — what the engine makes of a reading before it is submitted: the
// sweep's key figures and the value normalised to STC with its uncertainty, weight and flags.
// Nothing is stored. The body has the reading form's fields; the sweep as `sweep` points or `sweepCsv`.
import type { Route } from "./+types/api.v1.readings.preview";
import { evaluateReading } from "~/domain/readings/evaluate-reading";
import { readingPreviewSchema } from "~/lib/reading-forms";
import { requireApiActor } from "~/server/guards.server";
import { jsonError, readJsonBody } from "~/server/json-body.server";
import { findReadableModule } from "~/server/readings/reading-queries.server";
import { moduleForEngine } from "~/server/readings/submit-reading.server";

// Without a loader a GET would fall through to React Router's "Unexpected Server Error" 400.
export function loader() {
  return jsonError(405, "Use POST with the reading as JSON.");
}

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "Use POST.");
  await requireApiActor(request);
  const body = await readJsonBody(request);
  const parsed = readingPreviewSchema.safeParse(body);
  if (!parsed.success) {
    const fields: Record<string, string> = {};
    for (const issue of parsed.error.issues) fields[issue.path.join(".") || "body"] ??= issue.message;
    return jsonError(400, "Some fields need attention.", fields);
  }
  const value = parsed.data;
  const module = await findReadableModule(value.moduleId);
  if (!module) return jsonError(400, "Some fields need attention.", { moduleId: "No module with this id." });
  const sweepSource = value.kind !== "sweep" ? null : value.sweep ? { points: value.sweep } : value.sweepCsv !== undefined ? { csv: value.sweepCsv } : null;
  const evaluation = evaluateReading(value, moduleForEngine(module), sweepSource);
  if (!evaluation.ok) {
    const field = evaluation.field === "sweepFile" ? (value.sweep ? "sweep" : "sweepCsv") : evaluation.field;
    return jsonError(400, evaluation.message, { [field]: evaluation.message });
  }
  const { reading, sweep, takenAtUtc } = evaluation;
  return Response.json({
    module: { id: module.id, maker: module.maker, model: module.model, nameplatePmaxW: module.pmax_w },
    takenAt: takenAtUtc.toISOString(),
    sweep: sweep ? { ...sweep.analysis, durationS: sweep.durationS } : null,
    measuredPmaxW: reading.measuredPmaxW,
    irradianceWm2: reading.irradianceWm2,
    irradianceSource: reading.irradianceSource,
    cellTempC: reading.cellTempC,
    stcPmaxW: reading.stcPmaxW,
    ratioToNameplate: reading.ratioToNameplate,
    uncertaintyPct: reading.uncertaintyPct,
    weight: reading.weight,
    flags: reading.flags,
    working: reading.working,
  });
}
