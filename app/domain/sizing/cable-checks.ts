// Checks on cables and protection: each run's conductor carries what its fuse lets through (safety),
// its voltage drop meets the target (advisory), and PV string fuses where three or more strings meet.
import type { CableRunSizing } from "./cables";
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { fmt } from "./format";
import { PV_MAX_CURRENT_FACTOR, CONTINUOUS_DUTY_FACTOR, nextStandardRatingA, stringFusesNeeded } from "./fuses";
import type { ModulePart } from "./parts";
import type { LayoutEvaluation } from "./string-layout";
import { stringIscA } from "./protection";

export function cableChecks(run: CableRunSizing): PlanCheck[] {
  const checks: PlanCheck[] = [];
  const c = run.conductor;
  const carriesOk = c !== null && run.protectionA !== null;
  checks.push({
    id: `cable.${run.id}.current`,
    kind: "safety",
    status: carriesOk ? "pass" : "fail",
    title: `${run.label}: conductor and fuse`,
    sentence: carriesOk
      ? `${c.label} carries the circuit's ${fmt(run.maxCircuitCurrentA)} A with the 1.25 factor (${fmt(run.minAmpacityA)} A) and is protected by a fuse or breaker of ${run.protectionA} A.`
      : run.protectionA === null
        ? `The circuit needs protection of at least ${fmt(run.minAmpacityA)} A, above the standard ratings listed: split it into parallel circuits or raise the system voltage.`
        : `No single conductor in the table carries ${fmt(run.minAmpacityA)} A behind a fuse of ${run.protectionA} A: use parallel conductors or raise the system voltage.`,
    figures: [
      figure("Circuit current", run.maxCircuitCurrentA, "A"),
      figure("Ampacity needed (× 1.25)", run.minAmpacityA, "A"),
      ...(run.protectionA === null ? [] : [figure("Fuse or breaker", run.protectionA, "A")]),
      ...(c === null ? [] : [figure("Conductor ampacity", c.ampacityA, "A"), figure("Conductor area", c.areaMm2, "mm²")]),
    ],
    basis: `Conductor and overcurrent device ≥ 1.25 × the circuit current (NEC 690.8(B), 690.9); next standard rating; the fuse protects the conductor.`,
  });
  if (c !== null && run.dropV !== null && run.dropPct !== null) {
    checks.push({
      id: `cable.${run.id}.voltage-drop`,
      kind: "advisory",
      status: run.meetsDropTarget ? "pass" : "warn",
      title: `${run.label}: voltage drop`,
      sentence: run.meetsDropTarget
        ? `${c.label} over ${fmt(run.oneWayLengthM)} m one way drops ${fmt(run.dropV, 2)} V at ${fmt(run.operatingCurrentA)} A, ${fmt(run.dropPct, 2)} % of ${fmt(run.voltageV)} V (target ${fmt(run.dropTargetPct)} %).`
        : `Even ${c.label}, the largest listed, drops ${fmt(run.dropPct, 2)} % over ${fmt(run.oneWayLengthM)} m one way (target ${fmt(run.dropTargetPct)} %): shorten the run, use parallel conductors or a higher voltage.`,
      figures: [
        figure("One-way length", run.oneWayLengthM, "m"),
        figure("Current", run.operatingCurrentA, "A"),
        figure("Resistance", c.ohmPerKm, "Ω/km"),
        figure("Voltage drop", run.dropV, "V"),
        figure("Voltage drop", run.dropPct, "%"),
        figure("Target", run.dropTargetPct, "%"),
      ],
      basis: "Vd = 2·L·I·R′, L one way; conductor resistance at 75 °C; 3 % is the usual target (advisory).",
    });
  }
  return checks;
}

/** PV string fuses: needed with three or more strings in parallel, each ≥ 1.56 × Isc and ≤ the module's maximum series fuse. */
export function stringFuseCheck(module: ModulePart, layout: LayoutEvaluation): PlanCheck {
  const needed = stringFusesNeeded(layout.stringsInParallel);
  const minA = PV_MAX_CURRENT_FACTOR * CONTINUOUS_DUTY_FACTOR * stringIscA(layout);
  const ratingA = nextStandardRatingA(minA);
  const figures = [figure("Strings in parallel", layout.stringsInParallel, ""), figure("1.56 × Isc", minA, "A")];
  if (!needed) {
    return {
      id: "protection.pv-string-fuses",
      kind: "safety",
      status: "pass",
      title: "PV string fuses",
      sentence: `With ${layout.stringsInParallel} string(s) no string can be back-fed by more than one other: string fuses are not required.`,
      figures,
      basis: "String fuses with three or more strings in parallel (NEC 690.9(A), from memory).",
    };
  }
  const maxFuse = module.maxSeriesFuseA ?? null;
  let status: PlanCheck["status"] = "pass";
  let sentence = `Fuse each of the ${layout.stringsInParallel} strings at ${ratingA} A (at least 1.56 × Isc = ${fmt(minA)} A), within the module's ${maxFuse} A maximum series fuse.`;
  if (maxFuse === null) {
    status = "warn";
    sentence = `Fuse each of the ${layout.stringsInParallel} strings at ${ratingA} A (at least 1.56 × Isc = ${fmt(minA)} A); check it does not exceed the module's maximum series fuse rating on its datasheet.`;
  } else if (ratingA === null || ratingA > maxFuse) {
    status = "fail";
    sentence = `The string fuse must be at least ${fmt(minA)} A but the module allows at most ${maxFuse} A: these modules cannot be protected in ${layout.stringsInParallel} parallel strings. Use longer strings or fewer of them.`;
  }
  return {
    id: "protection.pv-string-fuses",
    kind: "safety",
    status,
    title: "PV string fuses",
    sentence,
    figures: [
      ...figures,
      ...(ratingA === null ? [] : [figure("String fuse", ratingA, "A")]),
      ...(maxFuse === null ? [] : [figure("Module's maximum series fuse", maxFuse, "A")]),
    ],
    basis: "String fuse ≥ 1.56 × Isc, next standard rating, ≤ the module's maximum series fuse (NEC 690.8, 690.9; from memory).",
  };
}
