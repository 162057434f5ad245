// The charge controller form: one rated PV power per battery-bank voltage it charges.
import { PartFormShell } from "./part-form-shell";
import { usePartForm, type PartFormProps } from "./use-part-form";
import { FieldGroup, NumberField, SelectField, TextInput } from "../part-fields";
import { controllerFormSchema } from "~/lib/catalogue-forms";

export function ControllerForm({ lastResult, defaultValue, pending, submitLabel }: PartFormProps) {
  const [form, fields] = usePartForm(controllerFormSchema, lastResult, defaultValue);
  return (
    <PartFormShell form={form} pending={pending} submitLabel={submitLabel}>
      <FieldGroup title="Model">
        <TextInput field={fields.maker} label="Maker" />
        <TextInput field={fields.model} label="Model" />
        <SelectField
          field={fields.kind}
          label="Type"
          options={
            [
              ["pwm", "PWM"],
              ["mppt", "MPPT"],
            ] as const
          }
        />
        <NumberField field={fields.efficiencyPct} label="Efficiency" unit="%" />
      </FieldGroup>
      <FieldGroup title="PV input">
        <NumberField field={fields.maxPvVocV} label="Max PV input voltage" unit="V" hint="The array's Voc on the coldest morning must stay below this." />
        <NumberField field={fields.maxChargeCurrentA} label="Max charge current" unit="A" />
      </FieldGroup>
      <FieldGroup title="Max PV power per battery bank" note="Leave a bank voltage blank when the controller does not charge it.">
        <NumberField field={fields.maxPvPower12W} label="12 V bank" unit="W" />
        <NumberField field={fields.maxPvPower24W} label="24 V bank" unit="W" />
        <NumberField field={fields.maxPvPower36W} label="36 V bank" unit="W" />
        <NumberField field={fields.maxPvPower48W} label="48 V bank" unit="W" />
      </FieldGroup>
    </PartFormShell>
  );
}
