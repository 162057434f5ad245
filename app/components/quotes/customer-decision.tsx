// The customer's choice on a sent quote: approve by typing their name (kept as their acceptance), or
// decline with a comment the installer reads.
import { getFormProps, getInputProps, getTextareaProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { FieldError, FormErrors, inputClass, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { approveSchema, declineSchema } from "~/lib/quote-forms";

export function CustomerDecision({
  approveResult,
  declineResult,
  deposit,
}: {
  approveResult?: SubmissionResult<string[]> | null;
  declineResult?: SubmissionResult<string[]> | null;
  deposit: string;
}) {
  const navigation = useNavigation();
  const busy = navigation.state === "submitting" ? navigation.formData?.get("intent") : null;
  const [approve, a] = useForm({
    id: "approve",
    lastResult: approveResult,
    constraint: getZodConstraint(approveSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: approveSchema }),
    shouldValidate: "onBlur",
  });
  const [decline, d] = useForm({
    id: "decline",
    lastResult: declineResult,
    constraint: getZodConstraint(declineSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: declineSchema }),
    shouldValidate: "onBlur",
  });
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <Panel title="Approve">
        <Form method="post" {...getFormProps(approve)} className="space-y-3">
          <input type="hidden" name="intent" value="approve" />
          <FormErrors errors={approve.errors} />
          <TextField field={a.acceptedName} label="Type your full name" autoComplete="name" />
          <label className="flex items-start gap-2 text-sm">
            <input {...getInputProps(a.confirm, { type: "checkbox", value: "on" })} className="mt-1" />
            <span>I approve this quote, its terms and the deposit of {deposit}, which I will pay by card next.</span>
          </label>
          <FieldError id={a.confirm.errorId} errors={a.confirm.errors} />
          <button
            type="submit"
            disabled={busy === "approve"}
            className="w-full rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark disabled:opacity-60"
          >
            {busy === "approve" ? "Approving…" : "Approve quote"}
          </button>
        </Form>
      </Panel>
      <Panel title="Decline">
        <Form method="post" {...getFormProps(decline)} className="space-y-3">
          <input type="hidden" name="intent" value="decline" />
          <FormErrors errors={decline.errors} />
          <label htmlFor={d.comment.id} className="block text-sm font-medium">
            Why? The installer reads this and may send a revised quote.
          </label>
          <textarea {...getTextareaProps(d.comment)} rows={4} className={inputClass} />
          <FieldError id={d.comment.errorId} errors={d.comment.errors} />
          <button
            type="submit"
            disabled={busy === "decline"}
            className="w-full rounded-md border border-fail px-4 py-2 font-medium text-fail disabled:opacity-60"
          >
            Decline quote
          </button>
        </Form>
      </Panel>
    </div>
  );
}
