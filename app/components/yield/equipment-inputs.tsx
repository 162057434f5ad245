import type { YieldFormState } from "~/lib/yield-form";
import { NumberInput } from "./number-input";

const CUSTOM_FIELDS: { key: keyof YieldFormState["custom"]; label: string; unit: string }[] = [
  { key: "pmaxW", label: "Pmax", unit: "W" },
  { key: "vmpV", label: "Vmp", unit: "V" },
  { key: "impA", label: "Imp", unit: "A" },
  { key: "vocV", label: "Voc", unit: "V" },
  { key: "iscA", label: "Isc", unit: "A" },
  { key: "noctC", label: "NOCT", unit: "°C" },
  { key: "gammaPmaxPctPerC", label: "γ Pmax", unit: "%/°C" },
  { key: "betaVocPctPerC", label: "β Voc", unit: "%/°C" },
  { key: "alphaIscPctPerC", label: "α Isc", unit: "%/°C" },
];

const selectClass = "block w-full rounded-md border border-rule bg-sheet px-3 py-2";

export function EquipmentInputs({
  state,
  errors,
  update,
  modules,
}: {
  state: YieldFormState;
  errors: Record<string, string>;
  update: (patch: Partial<YieldFormState>) => void;
  modules: { id: string; label: string }[];
}) {
  return (
    <div className="space-y-4">
      <div>
        <label htmlFor="module" className="mb-1 block text-sm font-medium">
          Module
        </label>
        <select id="module" value={state.moduleId} onChange={(e) => update({ moduleId: e.target.value })} className={selectClass}>
          {modules.map((m) => (
            <option key={m.id} value={m.id}>
              {m.label}
            </option>
          ))}
          <option value="">Figures from a datasheet…</option>
        </select>
        {errors["module.moduleId"] ? <p className="mt-0.5 text-xs text-fail">✕ {errors["module.moduleId"]}</p> : null}
      </div>
      {state.moduleId ? (
        <fieldset className="text-sm">
          <legend className="mb-1 font-medium">Power basis</legend>
          <label className="mr-4 inline-flex items-center gap-1.5">
            <input type="radio" name="powerBasis" checked={state.powerBasis === "nameplate"} onChange={() => update({ powerBasis: "nameplate" })} />
            Nameplate
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="powerBasis" checked={state.powerBasis === "verified"} onChange={() => update({ powerBasis: "verified" })} />
            Verified by field readings
          </label>
        </fieldset>
      ) : null}
      {state.moduleId === "" ? (
        <div className="grid grid-cols-3 gap-2">
          {CUSTOM_FIELDS.map(({ key, label, unit }) => (
            <NumberInput
              key={key}
              id={`module-${key}`}
              label={label}
              unit={unit}
              value={state.custom[key]}
              onChange={(v) => update({ custom: { ...state.custom, [key]: v } })}
              error={errors[`module.${key}`]}
            />
          ))}
        </div>
      ) : null}
      <div className="grid grid-cols-3 gap-2">
        <div>
          <label htmlFor="controller-kind" className="mb-1 block text-sm font-medium">
            Controller
          </label>
          <select
            id="controller-kind"
            value={state.controllerKind}
            onChange={(e) => update({ controllerKind: e.target.value as "mppt" | "pwm" })}
            className={selectClass}
          >
            <option value="mppt">MPPT</option>
            <option value="pwm">PWM</option>
          </select>
        </div>
        <div>
          <label htmlFor="battery-voltage" className="mb-1 block text-sm font-medium">
            Battery <span className="font-normal text-ink-faint">(V)</span>
          </label>
          <select id="battery-voltage" value={state.batteryVoltageV} onChange={(e) => update({ batteryVoltageV: e.target.value })} className={selectClass}>
            <option value="12">12</option>
            <option value="24">24</option>
            <option value="48">48</option>
          </select>
        </div>
        <NumberInput
          id="efficiency"
          label="Efficiency"
          unit="%"
          value={state.efficiencyPct}
          onChange={(v) => update({ efficiencyPct: v })}
          error={errors["controller.efficiencyPct"]}
        />
      </div>
      <div className="grid grid-cols-3 gap-2">
        <NumberInput id="soiling" label="Soiling" unit="%" value={state.soiling} onChange={(v) => update({ soiling: v })} error={errors["lossesPct.soiling"]} />
        <NumberInput
          id="mismatch"
          label="Mismatch"
          unit="%"
          value={state.mismatch}
          onChange={(v) => update({ mismatch: v })}
          error={errors["lossesPct.mismatch"]}
        />
        <NumberInput id="wiring" label="Wiring" unit="%" value={state.wiring} onChange={(v) => update({ wiring: v })} error={errors["lossesPct.wiring"]} />
      </div>
    </div>
  );
}
