// The three DC runs of a kit, their currents, overcurrent protection and conductor:
//   array → controller: operating current Imp × strings at Vmp × modules in series; circuit current
//     1.25 × Isc × strings (NEC 690.8(A)(1), see string-layout.ts); conductor and breaker ≥ 1.25 × that
//     = 1.56 × Isc (690.8(B));
//   controller → battery: the controller can push its rated charge current; fuse ≥ 1.25 × it;
//   battery → inverter: the inverter's continuous rating at its cut-out voltage; fuse ≥ 1.25 × it.
// The fuse protects the cable, so each conductor must be allowed at least the fuse's rating.
import { bankChargeVoltageV, INVERTER_CUTOUT_VOLTAGE_PER_12V } from "./chemistry";
import type { ConductorChoice, ConductorSystem } from "./conductors";
import { chooseConductor } from "./conductors";
import { CONTINUOUS_DUTY_FACTOR, nextStandardRatingA } from "./fuses";
import type { BatteryPart, ControllerPart, InverterPart, ModulePart, SystemVoltage } from "./parts";
import type { CableRunInput } from "./plan-types";
import type { LayoutEvaluation } from "./string-layout";

export type CableRunId = "array-to-controller" | "controller-to-battery" | "battery-to-inverter";

export const CABLE_RUN_LABELS: Record<CableRunId, string> = {
  "array-to-controller": "Array to charge controller",
  "controller-to-battery": "Charge controller to battery",
  "battery-to-inverter": "Battery to inverter",
};

export interface CableRunSizing extends ConductorChoice {
  id: CableRunId;
  label: string;
  oneWayLengthM: number;
  /** Voltage the drop is compared with, V. */
  voltageV: number;
  /** Current the drop is worked out at, A. */
  operatingCurrentA: number;
  /** Highest continuous current of the circuit, A. */
  maxCircuitCurrentA: number;
  /** Ampacity the conductor needs (1.25 × the circuit current), A. */
  minAmpacityA: number;
  /** Standard rating of the fuse or breaker protecting the run; null when none in the list is large enough. */
  protectionA: number | null;
  dropTargetPct: number;
}

interface RunContext {
  system: ConductorSystem;
  defaultDropTargetPct: number;
}

function sizeRun(
  id: CableRunId,
  input: CableRunInput,
  figures: { voltageV: number; operatingCurrentA: number; maxCircuitCurrentA: number },
  ctx: RunContext,
): CableRunSizing {
  const minAmpacityA = CONTINUOUS_DUTY_FACTOR * figures.maxCircuitCurrentA;
  const protectionA = nextStandardRatingA(minAmpacityA);
  const dropTargetPct = input.voltageDropTargetPct ?? ctx.defaultDropTargetPct;
  const choice = chooseConductor(ctx.system, {
    oneWayLengthM: input.oneWayLengthM,
    currentA: figures.operatingCurrentA,
    voltageV: figures.voltageV,
    dropTargetPct,
    minAmpacityA,
    protectionA,
  });
  return { id, label: CABLE_RUN_LABELS[id], oneWayLengthM: input.oneWayLengthM, ...figures, minAmpacityA, protectionA, dropTargetPct, ...choice };
}

export interface CableRunsInput {
  module: ModulePart;
  controller: ControllerPart;
  battery: BatteryPart;
  inverter: InverterPart | null;
  systemVoltageV: SystemVoltage;
  layout: LayoutEvaluation;
  runs: { arrayToController: CableRunInput; controllerToBattery: CableRunInput; batteryToInverter?: CableRunInput };
  system: ConductorSystem;
  dropTargetPct: number;
}

/** One-way length assumed for the battery→inverter run when none was given, m. */
export const DEFAULT_INVERTER_RUN_M = 2;

export function inverterMaxDcCurrentA(inverter: InverterPart, systemVoltageV: SystemVoltage): number {
  const cutoutV = (systemVoltageV / 12) * INVERTER_CUTOUT_VOLTAGE_PER_12V;
  return inverter.continuousW / ((inverter.efficiencyPct / 100) * cutoutV);
}

export function sizeCableRuns(input: CableRunsInput): CableRunSizing[] {
  const { module, controller, layout, systemVoltageV } = input;
  const ctx: RunContext = { system: input.system, defaultDropTargetPct: input.dropTargetPct };
  const chargeVoltageV = bankChargeVoltageV(systemVoltageV, input.battery.chemistry);
  const runs: CableRunSizing[] = [];
  const arrayVoltageV = controller.kind === "mppt" ? layout.modulesInSeries * module.vmpV : chargeVoltageV;
  runs.push(
    sizeRun(
      "array-to-controller",
      input.runs.arrayToController,
      {
        voltageV: arrayVoltageV,
        operatingCurrentA: layout.stringsInParallel * module.impA,
        maxCircuitCurrentA: layout.arrayMaxCurrentA,
      },
      ctx,
    ),
  );
  runs.push(
    sizeRun(
      "controller-to-battery",
      input.runs.controllerToBattery,
      {
        voltageV: systemVoltageV,
        operatingCurrentA: Math.min(layout.controllerOutputCurrentA, controller.maxChargeCurrentA),
        maxCircuitCurrentA: controller.maxChargeCurrentA,
      },
      ctx,
    ),
  );
  if (input.inverter) {
    const maxDcCurrentA = inverterMaxDcCurrentA(input.inverter, systemVoltageV);
    runs.push(
      sizeRun(
        "battery-to-inverter",
        input.runs.batteryToInverter ?? { oneWayLengthM: DEFAULT_INVERTER_RUN_M },
        {
          voltageV: systemVoltageV,
          operatingCurrentA: input.inverter.continuousW / ((input.inverter.efficiencyPct / 100) * systemVoltageV),
          maxCircuitCurrentA: maxDcCurrentA,
        },
        ctx,
      ),
    );
  }
  return runs;
}
