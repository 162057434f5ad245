// The offer form: supplier, catalogue part, price with its breaks by quantity, order and shipping
// terms, lead time, stock and the last day the price holds. Money fields are text (decimal point).
import { getFormProps, getInputProps, getSelectProps, getTextareaProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { FieldError, FormErrors, inputClass, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { OFFER_PART_KINDS, type OfferPartKind } from "~/domain/sourcing/offer-facts";
import { offerFormSchema, type OfferForm } from "~/lib/sourcing-forms";

const KIND_LABELS: Record<OfferPartKind, string> = { modules: "Module", batteries: "Battery", controllers: "Charge controller", inverters: "Inverter" };

export interface OfferFormChoices {
  suppliers: {
    id: string;
    name: string;
    currency: string;
    defaultShippingPerUnit: string;
    defaultShippingPerOrder: string;
    defaultLeadTimeDays: number | null;
  }[];
  parts: Record<OfferPartKind, { id: string; maker: string; model: string }[]>;
}

export function OfferFormView({
  defaultValue,
  lastResult,
  submitLabel,
  choices,
}: {
  defaultValue?: Partial<OfferForm>;
  lastResult?: SubmissionResult<string[]> | null;
  submitLabel: string;
  choices: OfferFormChoices;
}) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult,
    defaultValue,
    constraint: getZodConstraint(offerFormSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: offerFormSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const kind = (OFFER_PART_KINDS as readonly string[]).includes(fields.partKind.value ?? "") ? (fields.partKind.value as OfferPartKind) : "modules";
  const supplier = choices.suppliers.find((s) => s.id === fields.supplierId.value);
  const breaks = fields.priceBreaks.getFieldList();
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-6">
      <FormErrors errors={form.errors} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Who sells what">
          <div className="space-y-3">
            <div>
              <label htmlFor={fields.supplierId.id} className="mb-1 block text-sm font-medium">
                Supplier
              </label>
              <select {...getSelectProps(fields.supplierId)} className={inputClass}>
                <option value="">Choose…</option>
                {choices.suppliers.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.name} ({s.currency})
                  </option>
                ))}
              </select>
              <FieldError id={fields.supplierId.errorId} errors={fields.supplierId.errors} />
            </div>
            <div>
              <label htmlFor={fields.partKind.id} className="mb-1 block text-sm font-medium">
                Kind of part
              </label>
              <select {...getSelectProps(fields.partKind)} className={inputClass}>
                {OFFER_PART_KINDS.map((k) => (
                  <option key={k} value={k}>
                    {KIND_LABELS[k]}
                  </option>
                ))}
              </select>
              <FieldError id={fields.partKind.errorId} errors={fields.partKind.errors} />
            </div>
            <div>
              <label htmlFor={fields.partId.id} className="mb-1 block text-sm font-medium">
                {KIND_LABELS[kind]} from the catalogue
              </label>
              <select {...getSelectProps(fields.partId)} key={kind} className={inputClass}>
                <option value="">Choose…</option>
                {choices.parts[kind].map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.maker} {p.model}
                  </option>
                ))}
              </select>
              <FieldError id={fields.partId.errorId} errors={fields.partId.errors} />
            </div>
            <TextField field={fields.sku} label="Supplier's article number (optional)" />
          </div>
        </Panel>
        <Panel title="Price">
          <div className="space-y-3">
            <div className="grid grid-cols-2 gap-3">
              <TextField field={fields.unitPrice} label="Unit price" hint="Decimal point, no currency sign, e.g. 58.50." />
              <TextField
                field={fields.currency}
                label="Currency (blank = supplier's)"
                hint={supplier ? `${supplier.name} quotes in ${supplier.currency}.` : undefined}
              />
            </div>
            <fieldset>
              <legend className="mb-1 text-sm font-medium">Price breaks by quantity (optional)</legend>
              {breaks.length === 0 ? <p className="text-xs text-ink-faint">None: the unit price applies to any quantity.</p> : null}
              <ul className="space-y-2">
                {breaks.map((b, i) => {
                  const row = b.getFieldset();
                  return (
                    <li key={b.key} className="flex flex-wrap items-start gap-2">
                      <div className="w-32">
                        <label htmlFor={row.minQuantity.id} className="block text-xs text-ink-soft">
                          From quantity
                        </label>
                        <input {...getInputProps(row.minQuantity, { type: "text" })} className={inputClass} />
                        <FieldError errors={row.minQuantity.errors} />
                      </div>
                      <div className="w-36">
                        <label htmlFor={row.unitPrice.id} className="block text-xs text-ink-soft">
                          Unit price
                        </label>
                        <input {...getInputProps(row.unitPrice, { type: "text" })} className={inputClass} />
                        <FieldError errors={row.unitPrice.errors} />
                      </div>
                      <button
                        {...form.remove.getButtonProps({ name: fields.priceBreaks.name, index: i })}
                        className="mt-5 rounded border border-rule px-2 py-1 text-sm text-ink-soft"
                      >
                        Remove
                      </button>
                    </li>
                  );
                })}
              </ul>
              <button
                {...form.insert.getButtonProps({ name: fields.priceBreaks.name })}
                className="mt-2 rounded border border-copper px-2 py-1 text-sm text-copper"
              >
                Add a price break
              </button>
              <FieldError errors={fields.priceBreaks.errors} />
            </fieldset>
          </div>
        </Panel>
        <Panel title="Order and delivery">
          <div className="grid grid-cols-2 gap-3">
            <TextField field={fields.minimumOrder} label="Minimum order (units)" hint="Blank = 1." />
            <TextField
              field={fields.leadTimeDays}
              label="Lead time (days)"
              hint={supplier?.defaultLeadTimeDays != null ? `Blank = the supplier's ${supplier.defaultLeadTimeDays} d.` : undefined}
            />
            <TextField
              field={fields.shippingPerUnit}
              label="Shipping per unit"
              hint={supplier ? `Blank = the supplier's ${supplier.defaultShippingPerUnit} ${supplier.currency}.` : "Blank = the supplier's default."}
            />
            <TextField
              field={fields.shippingPerOrder}
              label="Shipping per order"
              hint={supplier ? `Blank = the supplier's ${supplier.defaultShippingPerOrder} ${supplier.currency}.` : "Blank = the supplier's default."}
            />
            <TextField field={fields.stock} label="In stock (units, optional)" />
            <TextField
              field={fields.validUntil}
              label="Valid until (YYYY-MM-DD, optional)"
              hint="The last day the price holds. Expired offers are kept, flagged, and left out of comparisons."
            />
          </div>
        </Panel>
        <Panel title="Notes">
          <textarea {...getTextareaProps(fields.notes)} rows={4} className="w-full rounded-md border border-rule bg-sheet p-2" aria-label="Notes" />
          <FieldError errors={fields.notes.errors} />
        </Panel>
      </div>
      <SubmitButton pending={navigation.state === "submitting"}>{submitLabel}</SubmitButton>
    </Form>
  );
}
