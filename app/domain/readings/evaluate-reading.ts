// From what the installer entered to a normalised reading: read the sweep (CSV text or points),
// find its key figures, then normalise to STC. The same function drives the live preview in the
// browser, the JSON preview API and the stored result, so all three agree.
import { analyzeLoadSweep, type SweepAnalysis, type SweepPoint } from "../solar/load-sweep";
import { normaliseReading, type NormalisedReading, type ReadingModule } from "./normalise-reading";
import { localTimeToUtc } from "./reading-time";
import { parseSweepCsv } from "./sweep-csv";

export interface ReadingConditions {
  kind: "single" | "sweep";
  measuredPmaxW?: number;
  measuredVoltageV?: number;
  measuredCurrentA?: number;
  sweepDurationS?: number;
  takenAtLocal: string;
  utcOffsetH: number;
  latitudeDeg: number;
  longitudeDeg: number;
  tiltDeg: number;
  azimuthDeg: number;
  airTempC: number;
  moduleTempC?: number;
  irradianceSource: "pyranometer" | "reference-cell" | "clear-sky-estimate";
  irradianceWm2?: number;
}

export type SweepSource = { csv: string } | { points: SweepPoint[] } | null;

export interface EvaluatedSweep {
  points: SweepPoint[];
  analysis: Extract<SweepAnalysis, { ok: true }>;
  durationS: number | null;
}

export type Evaluation =
  { ok: true; takenAtUtc: Date; sweep: EvaluatedSweep | null; reading: NormalisedReading } | { ok: false; field: string; message: string };

/** Reads and analyses a sweep; the field for errors is the form's file input. */
export function evaluateSweep(
  source: Exclude<SweepSource, null>,
  typedDurationS?: number,
): { ok: true; sweep: EvaluatedSweep } | { ok: false; field: string; message: string } {
  let points: SweepPoint[];
  let durationS: number | null = typedDurationS ?? null;
  if ("csv" in source) {
    const parsed = parseSweepCsv(source.csv);
    if (!parsed.ok) return { ok: false, field: "sweepFile", message: parsed.message };
    points = parsed.points;
    // A time column in the file is better evidence than a typed duration.
    if (parsed.durationS !== null) durationS = parsed.durationS;
  } else {
    points = source.points;
  }
  const analysis = analyzeLoadSweep(points);
  if (!analysis.ok) return { ok: false, field: "sweepFile", message: analysis.reason };
  return { ok: true, sweep: { points, analysis, durationS } };
}

export function evaluateReading(conditions: ReadingConditions, module: ReadingModule, sweepSource: SweepSource, now?: Date): Evaluation {
  const takenAtUtc = localTimeToUtc(conditions.takenAtLocal, conditions.utcOffsetH);
  if (!takenAtUtc) return { ok: false, field: "takenAtLocal", message: "Enter a real date and time." };

  let sweep: EvaluatedSweep | null = null;
  let measured: Parameters<typeof normaliseReading>[0]["measured"];
  if (conditions.kind === "sweep") {
    if (!sweepSource) return { ok: false, field: "sweepFile", message: "Attach the load sweep as a CSV file." };
    const read = evaluateSweep(sweepSource, conditions.sweepDurationS);
    if (!read.ok) return read;
    sweep = read.sweep;
    measured = { kind: "sweep", points: sweep.points, analysis: sweep.analysis, durationS: sweep.durationS };
  } else {
    const { measuredPmaxW: p, measuredVoltageV: v, measuredCurrentA: i } = conditions;
    const pmaxW = p ?? (v !== undefined && i !== undefined ? v * i : undefined);
    if (pmaxW === undefined || !(pmaxW > 0)) return { ok: false, field: "measuredPmaxW", message: "Enter the power, or both the voltage and the current." };
    measured = { kind: "single", pmaxW };
  }

  const irradiance =
    conditions.irradianceSource === "clear-sky-estimate"
      ? ({ source: "clear-sky-estimate" } as const)
      : conditions.irradianceWm2 === undefined
        ? null
        : ({ source: conditions.irradianceSource, irradianceWm2: conditions.irradianceWm2 } as const);
  if (!irradiance) return { ok: false, field: "irradianceWm2", message: "Enter the measured irradiance, or choose the clear-sky estimate." };

  const outcome = normaliseReading({
    module,
    measured,
    takenAtUtc,
    latitudeDeg: conditions.latitudeDeg,
    longitudeDeg: conditions.longitudeDeg,
    tiltDeg: conditions.tiltDeg,
    azimuthDeg: conditions.azimuthDeg,
    airTempC: conditions.airTempC,
    moduleTempC: conditions.moduleTempC ?? null,
    irradiance,
    now,
  });
  if (!outcome.ok) return outcome;
  return { ok: true, takenAtUtc, sweep, reading: outcome.reading };
}
