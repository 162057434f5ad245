// The live preview on the reading form: what the engine makes of the fields entered so far. Runs
// in the browser with the same pure functions the server uses when the reading is stored.
import { evaluateReading, evaluateSweep, type EvaluatedSweep, type Evaluation, type ReadingConditions } from "~/domain/readings/evaluate-reading";
import type { ReadingModule } from "~/domain/readings/normalise-reading";

export type SweepPreview = { state: "none" } | { state: "error"; message: string } | { state: "ok"; sweep: EvaluatedSweep };

export type ReadingPreview =
  | { state: "incomplete"; missing: string[] }
  | { state: "error"; field: string; message: string }
  | { state: "ok"; evaluation: Extract<Evaluation, { ok: true }> };

const REQUIRED: [keyof ReadingConditions, string][] = [
  ["takenAtLocal", "time of the reading"],
  ["utcOffsetH", "UTC offset"],
  ["latitudeDeg", "latitude"],
  ["longitudeDeg", "longitude"],
  ["tiltDeg", "tilt"],
  ["azimuthDeg", "azimuth"],
  ["airTempC", "air temperature"],
];

function numberOrUndefined(text: string | undefined): number | undefined {
  if (text === undefined || text.trim() === "") return undefined;
  const value = Number(text.trim());
  return Number.isFinite(value) ? value : undefined;
}

export function previewSweep(csvText: string | null, typedDurationS?: string): SweepPreview {
  if (csvText === null) return { state: "none" };
  const read = evaluateSweep({ csv: csvText }, numberOrUndefined(typedDurationS));
  return read.ok ? { state: "ok", sweep: read.sweep } : { state: "error", message: read.message };
}

export function previewReading(values: Record<string, string>, csvText: string | null, module: ReadingModule | null, now = new Date()): ReadingPreview {
  const missing: string[] = [];
  if (!module) missing.push("module");
  const kind = values.kind === "sweep" ? "sweep" : "single";
  const conditions: Partial<ReadingConditions> = {
    kind,
    takenAtLocal: values.takenAtLocal?.trim() || undefined,
    irradianceSource: (["pyranometer", "reference-cell", "clear-sky-estimate"] as const).find((s) => s === values.irradianceSource),
  };
  for (const name of [
    "measuredPmaxW",
    "measuredVoltageV",
    "measuredCurrentA",
    "sweepDurationS",
    "utcOffsetH",
    "latitudeDeg",
    "longitudeDeg",
    "tiltDeg",
    "azimuthDeg",
    "airTempC",
    "moduleTempC",
    "irradianceWm2",
  ] as const) {
    conditions[name] = numberOrUndefined(values[name]);
  }
  if (kind === "single" && conditions.measuredPmaxW === undefined && (conditions.measuredVoltageV === undefined || conditions.measuredCurrentA === undefined)) {
    missing.push("measured power (or voltage and current)");
  }
  if (kind === "sweep" && csvText === null) missing.push("sweep CSV");
  for (const [name, label] of REQUIRED) if (conditions[name] === undefined) missing.push(label);
  if (!conditions.irradianceSource) missing.push("irradiance source");
  else if (conditions.irradianceSource !== "clear-sky-estimate" && conditions.irradianceWm2 === undefined) missing.push("measured irradiance");
  if (missing.length || !module) return { state: "incomplete", missing };

  const evaluation = evaluateReading(conditions as ReadingConditions, module, kind === "sweep" && csvText !== null ? { csv: csvText } : null, now);
  return evaluation.ok ? { state: "ok", evaluation } : { state: "error", field: evaluation.field, message: evaluation.message };
}
