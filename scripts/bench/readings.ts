// Field-reading figures: reading, analysing and normalising an uploaded sweep (what the reading form
// runs on every change in the browser, and the server once on submit). Invented curve only.
import { performance } from "node:perf_hooks";
import { evaluateReading, type ReadingConditions } from "../../app/domain/readings/evaluate-reading";
import { currentAtVoltageA, explicitIvModel } from "../../app/domain/solar/iv-model";

const CURVE = explicitIvModel({ vocV: 21.3, iscA: 4.9, vmpV: 17.2, impA: 4.5 });
const CONDITIONS: ReadingConditions = {
  kind: "sweep",
  takenAtLocal: "2026-09-08T12:40",
  utcOffsetH: 1,
  latitudeDeg: 46.41,
  longitudeDeg: 9.83,
  tiltDeg: 40,
  azimuthDeg: 180,
  airTempC: 18,
  moduleTempC: 40,
  irradianceSource: "pyranometer",
  irradianceWm2: 910,
};
const MODULE = { pmaxW: 100, gammaPmaxPctPerC: -0.39, noctC: 45 };

function sweepCsv(points: number) {
  const rows = Array.from({ length: points }, (_, i) => {
    const v = (21.3 * i) / (points - 1);
    return `${v.toFixed(4)},${currentAtVoltageA(CURVE, v).toFixed(5)}`;
  });
  return ["voltage (V),current (A)", ...rows].join("\n");
}

export function printReadingsBench() {
  for (const points of [70, 500, 2000]) {
    const csv = sweepCsv(points);
    for (let i = 0; i < 20; i++) evaluateReading(CONDITIONS, MODULE, { csv });
    const runs = 200;
    const started = performance.now();
    for (let i = 0; i < runs; i++) evaluateReading(CONDITIONS, MODULE, { csv });
    const ms = (performance.now() - started) / runs;
    console.log(
      `  sweep of ${String(points).padStart(4)} points (${(csv.length / 1024).toFixed(1).padStart(4)} KB): ${ms.toFixed(2)} ms to parse, analyse and normalise`,
    );
  }
}
