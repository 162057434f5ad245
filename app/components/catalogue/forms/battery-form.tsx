// The battery form.
import { PartFormShell } from "./part-form-shell";
import { usePartForm, type PartFormProps } from "./use-part-form";
import { FieldGroup, NumberField, SelectField, TextInput } from "../part-fields";
import { BATTERY_CHEMISTRIES, CHEMISTRY_LABELS } from "~/domain/catalogue/part-kinds";
import { batteryFormSchema } from "~/lib/catalogue-forms";

export function BatteryForm({ lastResult, defaultValue, pending, submitLabel }: PartFormProps) {
  const [form, fields] = usePartForm(batteryFormSchema, lastResult, defaultValue);
  return (
    <PartFormShell form={form} pending={pending} submitLabel={submitLabel}>
      <FieldGroup title="Model">
        <TextInput field={fields.maker} label="Maker" />
        <TextInput field={fields.model} label="Model" />
        <SelectField field={fields.chemistry} label="Chemistry" options={BATTERY_CHEMISTRIES.map((c) => [c, CHEMISTRY_LABELS[c]] as const)} />
        <NumberField field={fields.nominalVoltageV} label="Nominal voltage" unit="V" />
      </FieldGroup>
      <FieldGroup
        title="Capacity and life"
        note="Usable depth of discharge is the share of capacity a kit plans to use each cycle; the cycle life is at that depth."
      >
        <NumberField field={fields.capacityAh} label="Capacity" unit="Ah" />
        <NumberField field={fields.capacityHourRateH} label="Rated at a discharge of" unit="hours" hint="20 for a C20 rating" />
        <NumberField field={fields.usableDodPct} label="Usable depth of discharge" unit="%" />
        <NumberField field={fields.cycleLife} label="Cycle life" unit="cycles" />
        <NumberField field={fields.roundTripEfficiencyPct} label="Round-trip efficiency" unit="%" />
        <NumberField field={fields.massKg} label="Mass (optional)" unit="kg" />
      </FieldGroup>
    </PartFormShell>
  );
}
