// The inverter form.
import { PartFormShell } from "./part-form-shell";
import { usePartForm, type PartFormProps } from "./use-part-form";
import { FieldGroup, NumberField, SelectField, TextInput } from "../part-fields";
import { INVERTER_DC_VOLTAGES } from "~/domain/catalogue/part-kinds";
import { inverterFormSchema } from "~/lib/catalogue-forms";

export function InverterForm({ lastResult, defaultValue, pending, submitLabel }: PartFormProps) {
  const [form, fields] = usePartForm(inverterFormSchema, lastResult, defaultValue);
  return (
    <PartFormShell form={form} pending={pending} submitLabel={submitLabel}>
      <FieldGroup title="Model">
        <TextInput field={fields.maker} label="Maker" />
        <TextInput field={fields.model} label="Model" />
        <SelectField
          field={fields.dcInputVoltageV}
          label="Battery (DC input) voltage"
          options={INVERTER_DC_VOLTAGES.map((v) => [String(v), `${v} V`] as const)}
        />
      </FieldGroup>
      <FieldGroup title="Output and losses">
        <NumberField field={fields.continuousW} label="Continuous power" unit="W" />
        <NumberField field={fields.surgeW} label="Surge power" unit="W" hint="For motor and compressor starts" />
        <NumberField field={fields.efficiencyPct} label="Efficiency" unit="%" />
        <NumberField field={fields.idleDrawW} label="Idle draw" unit="W" hint="Drawn from the battery with no load, all day" />
      </FieldGroup>
    </PartFormShell>
  );
}
