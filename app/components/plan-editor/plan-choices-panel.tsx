// The left half of the plan editor: parts, system voltage and design choices.
import { errorPathFor, NUMBER_FIELDS, type NumberField, type PlanEditorState } from "~/lib/plan-editor-state";

export interface Option {
  id: string;
  label: string;
}

export interface PartOptions {
  modules: Option[];
  controllers: Option[];
  batteries: Option[];
  inverters: Option[];
  loadSheets: Option[];
}

const selectClass = "block w-full rounded-md border border-rule bg-sheet px-2 py-1.5 text-sm aria-[invalid]:border-fail";
const inputClass = "block w-full rounded-md border border-rule bg-sheet px-2 py-1.5 text-right text-sm figures aria-[invalid]:border-fail";

function Err({ message }: { message?: string }) {
  return message ? <p className="mt-0.5 text-xs text-fail">✕ {message}</p> : null;
}

function Select({
  id,
  label,
  value,
  options,
  onChange,
  error,
  none,
}: {
  id: string;
  label: string;
  value: string;
  options: Option[];
  onChange: (v: string) => void;
  error?: string;
  none?: string;
}) {
  return (
    <div>
      <label htmlFor={id} className="mb-0.5 block text-sm font-medium">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} aria-invalid={error ? true : undefined} className={selectClass}>
        {none !== undefined ? <option value="">{none}</option> : value === "" ? <option value="">Choose…</option> : null}
        {options.map((o) => (
          <option key={o.id} value={o.id}>
            {o.label}
          </option>
        ))}
      </select>
      <Err message={error} />
    </div>
  );
}

export function PlanChoicesPanel({
  state,
  options,
  errors,
  update,
}: {
  state: PlanEditorState;
  options: PartOptions;
  errors: Record<string, string>;
  update: (patch: Partial<PlanEditorState>) => void;
}) {
  const setNumber = (field: NumberField, value: string) => update({ numbers: { ...state.numbers, [field]: value } });
  const numberInput = (field: NumberField) => {
    const { label, unit } = NUMBER_FIELDS[field];
    const error = errors[errorPathFor(field)];
    return (
      <div key={field}>
        <label htmlFor={`n-${field}`} className="mb-0.5 block text-xs font-medium">
          {label}
          {unit ? <span className="font-normal text-ink-faint"> ({unit})</span> : null}
        </label>
        <input
          id={`n-${field}`}
          inputMode="decimal"
          value={state.numbers[field]}
          onChange={(e) => setNumber(field, e.target.value)}
          aria-invalid={error ? true : undefined}
          className={inputClass}
        />
        <Err message={error} />
      </div>
    );
  };
  return (
    <div className="space-y-4">
      <div>
        <label htmlFor="plan-name" className="mb-0.5 block text-sm font-medium">
          Plan name
        </label>
        <input
          id="plan-name"
          value={state.name}
          onChange={(e) => update({ name: e.target.value })}
          aria-invalid={errors.name ? true : undefined}
          className="block w-full rounded-md border border-rule bg-sheet px-2 py-1.5"
        />
        <Err message={errors.name} />
      </div>
      <Select
        id="load-sheet"
        label="Load sheet"
        value={state.loadSheetId}
        options={options.loadSheets}
        onChange={(v) => update({ loadSheetId: v })}
        error={errors.loadSheetId}
      />
      <div>
        <label htmlFor="system-voltage" className="mb-0.5 block text-sm font-medium">
          System voltage
        </label>
        <select id="system-voltage" value={state.systemVoltageV} onChange={(e) => update({ systemVoltageV: e.target.value })} className={selectClass}>
          <option value="12">12 V</option>
          <option value="24">24 V</option>
          <option value="48">48 V</option>
        </select>
        <Err message={errors.systemVoltageV} />
      </div>
      <Select id="module" label="Module" value={state.moduleId} options={options.modules} onChange={(v) => update({ moduleId: v })} error={errors.moduleId} />
      <Select
        id="controller"
        label="Charge controller"
        value={state.controllerId}
        options={options.controllers}
        onChange={(v) => update({ controllerId: v })}
        error={errors.controllerId}
      />
      <Select
        id="battery"
        label="Battery"
        value={state.batteryId}
        options={options.batteries}
        onChange={(v) => update({ batteryId: v })}
        error={errors.batteryId}
      />
      <Select
        id="inverter"
        label="Inverter"
        value={state.inverterId}
        options={options.inverters}
        onChange={(v) => update({ inverterId: v })}
        error={errors.inverterId}
        none="No inverter (DC loads only)"
      />
      <fieldset className="text-sm">
        <legend className="mb-0.5 font-medium">Size the array on</legend>
        <label className="mr-3 inline-flex items-center gap-1">
          <input type="radio" name="powerBasis" checked={state.powerBasis === "verified"} onChange={() => update({ powerBasis: "verified" })} /> verified power
        </label>
        <label className="inline-flex items-center gap-1">
          <input type="radio" name="powerBasis" checked={state.powerBasis === "nameplate"} onChange={() => update({ powerBasis: "nameplate" })} /> nameplate
          power
        </label>
      </fieldset>
      <div className="grid grid-cols-2 gap-2">
        {(["autonomyDays", "maxDepthOfDischargePct", "designMarginPct", "acceptableUnmetDaysPerYear", "maxArrayAreaM2"] as const).map(numberInput)}
      </div>
      <h3 className="text-sm font-semibold">String layout and battery strings</h3>
      <div className="grid grid-cols-3 gap-2">{(["modulesInSeries", "stringsInParallel", "batteryStrings"] as const).map(numberInput)}</div>
      <h3 className="text-sm font-semibold">Cables</h3>
      <fieldset className="text-sm">
        <legend className="sr-only">Conductor sizes</legend>
        <label className="mr-3 inline-flex items-center gap-1">
          <input type="radio" name="conductorSystem" checked={state.conductorSystem === "mm2"} onChange={() => update({ conductorSystem: "mm2" })} /> mm²
        </label>
        <label className="inline-flex items-center gap-1">
          <input type="radio" name="conductorSystem" checked={state.conductorSystem === "awg"} onChange={() => update({ conductorSystem: "awg" })} /> AWG
        </label>
      </fieldset>
      <div className="grid grid-cols-2 gap-2">
        {(["voltageDropTargetPct", "arrayToControllerM", "controllerToBatteryM", "batteryToInverterM"] as const).map(numberInput)}
      </div>
      <h3 className="text-sm font-semibold">Losses</h3>
      <div className="grid grid-cols-3 gap-2">{(["soiling", "mismatch", "wiring"] as const).map(numberInput)}</div>
    </div>
  );
}
