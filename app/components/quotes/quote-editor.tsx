// The installer's quote editor: who it is for, the quote-wide margin, discount, tax and deposit, and
// the lines (kit parts from the plan plus labour, mounting, freight and extras). A line's blank
// margin, discount or tax rate takes the quote-wide figure; totals follow every keystroke.
import { getFormProps, getInputProps, getSelectProps, getTextareaProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { FieldError, FormErrors, inputClass, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { LINE_KIND_LABELS, QUOTE_LINE_KINDS } from "~/domain/quotes/quote-types";
import { liveTotals, type TypedLine } from "~/lib/quote-live-totals";
import { quoteEditorSchema, type QuoteEditorForm } from "~/lib/quote-forms";
import { OfferPicker } from "./offer-picker";
import { QuoteTotalsTable } from "./quote-totals-table";

const cell = "w-full rounded border border-rule bg-sheet px-2 py-1 text-sm tabular-nums aria-[invalid]:border-fail";

export function QuoteEditor({
  defaultValue,
  lastResult,
  currency,
  offerChoices,
  sentRevision,
}: {
  defaultValue: QuoteEditorForm;
  lastResult?: SubmissionResult<string[]> | null;
  currency: string;
  /** The team's valid offers for each part line's part, cheapest first, keyed "partKind:partId". */
  offerChoices: Record<string, { offerId: string; supplierName: string; unitCost: string }[]>;
  /** Set when the revision being edited was already sent: saving starts the next revision. */
  sentRevision: number | null;
}) {
  const busy = useNavigation().state === "submitting";
  const [form, fields] = useForm({
    id: "quote-editor",
    lastResult,
    defaultValue,
    constraint: getZodConstraint(quoteEditorSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: quoteEditorSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const lines = fields.lines.getFieldList();
  const live = liveTotals(
    lines.map((l) => (l.value ?? {}) as TypedLine),
    { marginPct: fields.marginPct.value, discountPct: fields.discountPct.value, taxRatePct: fields.taxRatePct.value, depositPct: fields.depositPct.value },
    currency,
  );
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-6">
      <input type="hidden" name="intent" value="save" />
      <FormErrors errors={form.errors} />
      <Panel title="Customer and terms">
        <div className="grid gap-4 md:grid-cols-2">
          <TextField field={fields.title} label="Title" />
          <TextField field={fields.validUntil} label="Valid until (YYYY-MM-DD)" />
          <TextField field={fields.customerName} label="Customer's name" />
          <TextField field={fields.customerEmail} label="Customer's e-mail" type="email" />
        </div>
        <div className="mt-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          <TextField field={fields.marginPct} label="Margin on cost, %" hint="For lines without their own." />
          <TextField field={fields.discountPct} label="Discount, %" hint="For lines without their own." />
          <TextField field={fields.taxRatePct} label="Tax rate, %" hint="Your local rate; lines may differ." />
          <TextField field={fields.depositPct} label="Deposit, % of total" />
        </div>
        <div className="mt-4">
          <label htmlFor={fields.terms.id} className="mb-1 block text-sm font-medium">
            Terms
          </label>
          <textarea {...getTextareaProps(fields.terms)} rows={3} className={inputClass} />
          <FieldError id={fields.terms.errorId} errors={fields.terms.errors} />
        </div>
      </Panel>
      <Panel title="Lines">
        <FieldError id={fields.lines.errorId} errors={fields.lines.errors} />
        <div className="relative min-w-0 overflow-x-auto">
          <table className="w-full min-w-[44rem] text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th className="w-28 pb-2 font-medium">Kind</th>
                <th className="pb-2 font-medium">Description</th>
                <th className="w-16 pb-2 font-medium">Qty</th>
                <th className="w-24 pb-2 font-medium">Unit cost</th>
                <th className="w-16 pb-2 font-medium">Margin %</th>
                <th className="w-16 pb-2 font-medium">Disc. %</th>
                <th className="w-16 pb-2 font-medium">Tax %</th>
                <th className="w-8 pb-2">
                  <span className="sr-only">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {lines.map((line, i) => {
                const f = line.getFieldset();
                const errors = [f.kind, f.description, f.quantity, f.unitCost, f.marginPct, f.discountPct, f.taxRatePct].flatMap((x) => x.errors ?? []);
                return (
                  <tr key={line.key} className="align-top" data-testid="quote-line">
                    <td className="py-1 pr-2">
                      <select {...getSelectProps(f.kind)} aria-label={`Line ${i + 1} kind`} className={cell}>
                        {QUOTE_LINE_KINDS.map((k) => (
                          <option key={k} value={k}>
                            {LINE_KIND_LABELS[k]}
                          </option>
                        ))}
                      </select>
                      <input {...getInputProps(f.partKind, { type: "hidden" })} />
                      <input {...getInputProps(f.partId, { type: "hidden" })} />
                      <input {...getInputProps(f.offerId, { type: "hidden" })} />
                    </td>
                    <td className="py-1 pr-2">
                      <input {...getInputProps(f.description, { type: "text" })} aria-label={`Line ${i + 1} description`} className={cell} />
                      <OfferPicker
                        index={i}
                        choices={f.partKind.value && f.partId.value ? (offerChoices[`${f.partKind.value}:${f.partId.value}`] ?? []) : null}
                        offerId={f.offerId.value}
                        currency={currency}
                        onPick={(choice) => {
                          form.update({ name: f.offerId.name, value: choice.offerId });
                          form.update({ name: f.unitCost.name, value: choice.unitCost });
                          const description = f.description.value ?? "";
                          if (/\(from [^)]*\)$/.test(description))
                            form.update({ name: f.description.name, value: description.replace(/\(from [^)]*\)$/, `(from ${choice.supplierName})`) });
                        }}
                      />
                      {errors.length ? <p className="mt-1 text-xs text-fail">✕ {errors.join(" ")}</p> : null}
                    </td>
                    <td className="py-1 pr-2">
                      <input {...getInputProps(f.quantity, { type: "text" })} inputMode="decimal" aria-label={`Line ${i + 1} quantity`} className={cell} />
                    </td>
                    <td className="py-1 pr-2">
                      <input {...getInputProps(f.unitCost, { type: "text" })} inputMode="decimal" aria-label={`Line ${i + 1} unit cost`} className={cell} />
                    </td>
                    <td className="py-1 pr-2">
                      <input
                        {...getInputProps(f.marginPct, { type: "text" })}
                        inputMode="decimal"
                        placeholder={fields.marginPct.value}
                        aria-label={`Line ${i + 1} margin`}
                        className={cell}
                      />
                    </td>
                    <td className="py-1 pr-2">
                      <input
                        {...getInputProps(f.discountPct, { type: "text" })}
                        inputMode="decimal"
                        placeholder={fields.discountPct.value}
                        aria-label={`Line ${i + 1} discount`}
                        className={cell}
                      />
                    </td>
                    <td className="py-1 pr-2">
                      <input
                        {...getInputProps(f.taxRatePct, { type: "text" })}
                        inputMode="decimal"
                        placeholder={fields.taxRatePct.value}
                        aria-label={`Line ${i + 1} tax rate`}
                        className={cell}
                      />
                    </td>
                    <td className="py-1">
                      <button
                        {...form.remove.getButtonProps({ name: fields.lines.name, index: i })}
                        className="rounded px-2 py-1 text-fail hover:bg-fail-wash"
                        aria-label={`Remove line ${i + 1}`}
                      >
                        ✕
                      </button>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
        <div className="mt-3 flex flex-wrap gap-2">
          {(["labour", "mounting", "freight", "extra"] as const).map((kind) => (
            <button
              key={kind}
              {...form.insert.getButtonProps({ name: fields.lines.name, defaultValue: { kind, description: "", quantity: "1", unitCost: "" } })}
              className="rounded-md border border-copper px-3 py-1.5 text-sm font-medium text-copper-dark hover:bg-paper"
            >
              + {LINE_KIND_LABELS[kind]}
            </button>
          ))}
        </div>
        <p className="mt-2 text-xs text-ink-faint">
          Unit cost ({currency}) is what the line costs your team; the customer sees the unit price after your margin. A blank margin, discount or tax rate uses
          the quote-wide figure shown faintly.
        </p>
      </Panel>
      <Panel title="Totals">
        {live ? (
          <>
            <QuoteTotalsTable
              figures={{
                currency,
                net: live.totals.net.amount.toFixed(),
                taxBands: live.totals.taxBands.map((b) => ({ ratePct: b.ratePct, net: b.net.amount.toFixed(), tax: b.tax.amount.toFixed() })),
                gross: live.totals.gross.amount.toFixed(),
                depositPct: live.totals.depositPct,
                deposit: live.totals.deposit.amount.toFixed(),
              }}
            />
            {live.skipped ? <p className="mt-2 text-sm text-warn">⚠ {live.skipped} line(s) left out until their figures read as numbers.</p> : null}
          </>
        ) : (
          <p className="text-sm text-warn">⚠ Enter the quote-wide margin, discount, tax rate and deposit as numbers to see the totals.</p>
        )}
      </Panel>
      <div className="flex flex-wrap items-center gap-3">
        {sentRevision !== null ? (
          <div className="grow">
            <TextField field={fields.note} label="What changed (shown in the timeline)" />
          </div>
        ) : null}
        <SubmitButton pending={busy}>{sentRevision !== null ? `Save as revision ${sentRevision + 1}` : "Save draft"}</SubmitButton>
      </div>
    </Form>
  );
}
