// The module nameplate form, with the figures derived from it shown as the curator types.
import { PartFormShell } from "./part-form-shell";
import { usePartForm, type PartFormProps } from "./use-part-form";
import { NumberField, SelectField, TextInput, FieldGroup } from "../part-fields";
import { fillFactor, moduleAreaM2, moduleEfficiencyPct, powerDensityWm2 } from "~/domain/catalogue/derived-figures";
import { fmt } from "~/domain/catalogue/field-issues";
import { CELL_TECHNOLOGIES } from "~/domain/catalogue/part-kinds";
import { moduleFormSchema } from "~/lib/catalogue-forms";

function numbers(...values: (string | undefined)[]) {
  const parsed = values.map((v) => (v === undefined || v.trim() === "" ? NaN : Number(v)));
  return parsed.every((n) => Number.isFinite(n) && n > 0) ? parsed : null;
}

export function ModuleForm({ lastResult, defaultValue, pending, submitLabel }: PartFormProps) {
  const [form, fields] = usePartForm(moduleFormSchema, lastResult, defaultValue);
  const size = numbers(fields.pmaxW.value as string, fields.lengthMm.value as string, fields.widthMm.value as string);
  const electrical = numbers(fields.pmaxW.value as string, fields.vocV.value as string, fields.iscA.value as string);
  return (
    <PartFormShell form={form} pending={pending} submitLabel={submitLabel}>
      <FieldGroup title="Model">
        <TextInput field={fields.maker} label="Maker" />
        <TextInput field={fields.model} label="Model" />
        <SelectField field={fields.cellTechnology} label="Cell technology" options={CELL_TECHNOLOGIES.map((t) => [t, t] as const)} />
        <NumberField
          field={fields.cellsInSeries}
          label="Cells in series"
          unit="cells"
          hint="A half-cut module counts the cells of one string (e.g. 54 for 108 halves)."
        />
      </FieldGroup>
      <FieldGroup title="Electrical, at STC (1000 W/m², 25 °C cell)">
        <NumberField field={fields.pmaxW} label="Pmax" unit="W" />
        <span />
        <NumberField field={fields.vmpV} label="Vmp" unit="V" />
        <NumberField field={fields.impA} label="Imp" unit="A" />
        <NumberField field={fields.vocV} label="Voc" unit="V" />
        <NumberField field={fields.iscA} label="Isc" unit="A" />
      </FieldGroup>
      <FieldGroup title="Temperature">
        <NumberField field={fields.gammaPmaxPctPerC} label="Pmax coefficient γ" unit="%/°C" hint="Negative, e.g. −0.38" />
        <NumberField field={fields.betaVocPctPerC} label="Voc coefficient β" unit="%/°C" hint="Negative, e.g. −0.28" />
        <NumberField field={fields.alphaIscPctPerC} label="Isc coefficient α" unit="%/°C" hint="Positive, e.g. 0.05" />
        <span />
        <SelectField
          field={fields.nominalTempKind}
          label="Nominal temperature given as"
          options={
            [
              ["noct", "NOCT (open circuit)"],
              ["nmot", "NMOT (at maximum power)"],
            ] as const
          }
        />
        <NumberField field={fields.noctC} label="NOCT / NMOT" unit="°C" />
      </FieldGroup>
      <FieldGroup
        title="Size"
        note={
          <span data-testid="derived-preview">
            Derived:{" "}
            {size
              ? `area ${fmt(moduleAreaM2(size[1], size[2]), 3)} m² · ${fmt(powerDensityWm2(size[0], size[1], size[2]), 0)} W/m² · ${fmt(moduleEfficiencyPct(size[0], size[1], size[2]), 1)} % efficient`
              : "area, power density and efficiency appear once Pmax, length and width are in"}
            {electrical ? ` · fill factor ${fmt(fillFactor(electrical[0], electrical[1], electrical[2]), 2)}` : ""}
          </span>
        }
      >
        <NumberField field={fields.lengthMm} label="Length" unit="mm" />
        <NumberField field={fields.widthMm} label="Width" unit="mm" />
        <NumberField field={fields.massKg} label="Mass" unit="kg" />
      </FieldGroup>
    </PartFormShell>
  );
}
