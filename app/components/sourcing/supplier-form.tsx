// The supplier form (create and edit): one Conform form on the shared zod schema.
import { getFormProps, getTextareaProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { FieldError, FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { supplierFormSchema, type SupplierForm } from "~/lib/sourcing-forms";

export function SupplierFormView({
  defaultValue,
  lastResult,
  submitLabel,
}: {
  defaultValue?: Partial<SupplierForm>;
  lastResult?: SubmissionResult<string[]> | null;
  submitLabel: string;
}) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult,
    defaultValue,
    constraint: getZodConstraint(supplierFormSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: supplierFormSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-6">
      <FormErrors errors={form.errors} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Supplier">
          <div className="space-y-3">
            <TextField field={fields.name} label="Name" />
            <TextField field={fields.contact} label="Contact (optional)" hint="Person, e-mail, phone — whatever you reach them by." />
            <TextField field={fields.currency} label="Currency (ISO code)" hint="The currency their prices come in, e.g. EUR, GBP, CHF." />
          </div>
        </Panel>
        <Panel title="Default shipping terms">
          <div className="space-y-3">
            <TextField field={fields.shippingTerms} label="Terms in words (optional)" hint="e.g. pallet rate, free over 2000, collection possible." />
            <div className="grid grid-cols-2 gap-3">
              <TextField field={fields.defaultShippingPerUnit} label="Shipping per unit" hint="In the supplier's currency; blank = 0." />
              <TextField field={fields.defaultShippingPerOrder} label="Shipping per order" hint="Blank = 0." />
            </div>
            <TextField field={fields.defaultLeadTimeDays} label="Usual lead time (days, optional)" />
            <p className="text-xs text-ink-faint">A new offer from this supplier starts from these; each offer can differ.</p>
          </div>
        </Panel>
      </div>
      <Panel title="Notes">
        <textarea {...getTextareaProps(fields.notes)} rows={3} className="w-full rounded-md border border-rule bg-sheet p-2" aria-label="Notes" />
        <FieldError errors={fields.notes.errors} />
      </Panel>
      <SubmitButton pending={navigation.state === "submitting"}>{submitLabel}</SubmitButton>
    </Form>
  );
}
