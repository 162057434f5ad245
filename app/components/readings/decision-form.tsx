// Approve or reject one reading with a reason (sent to the submitter). Each form has its own
// fetcher, so an error shows under the reading it belongs to.
import { getFormProps, getTextareaProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useFetcher } from "react-router";
import { FieldError, FormErrors, inputClass } from "~/components/form-field";
import { decisionSchema } from "~/lib/reading-forms";

export function DecisionForm({ readingId, action, allowed }: { readingId: string; action: string; allowed: ("approved" | "rejected")[] }) {
  const fetcher = useFetcher<{ result: SubmissionResult<string[]> }>();
  const [form, fields] = useForm({
    id: `decide-${readingId}`,
    lastResult: fetcher.state === "idle" ? fetcher.data?.result : undefined,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: decisionSchema }),
    shouldValidate: "onSubmit",
  });
  const busy = fetcher.state !== "idle";
  return (
    <fetcher.Form method="post" action={action} {...getFormProps(form)} className="space-y-2">
      <input type="hidden" name="intent" value="decide" />
      <input type="hidden" name="readingId" value={readingId} />
      <FormErrors errors={form.errors} />
      <div>
        <label htmlFor={fields.reason.id} className="mb-1 block text-sm font-medium">
          Reason <span className="font-normal text-ink-faint">(sent to the submitter; required to reject)</span>
        </label>
        <textarea {...getTextareaProps(fields.reason)} rows={2} className={inputClass} />
        <FieldError id={fields.reason.errorId} errors={fields.reason.errors} />
      </div>
      <div className="flex flex-wrap gap-2">
        {allowed.includes("approved") ? (
          <button
            type="submit"
            name="decision"
            value="approved"
            disabled={busy}
            className="rounded-md bg-copper px-3 py-1.5 text-sm font-medium text-sheet hover:bg-copper-dark disabled:opacity-60"
          >
            <span aria-hidden="true">✓ </span>Approve
          </button>
        ) : null}
        {allowed.includes("rejected") ? (
          <button
            type="submit"
            name="decision"
            value="rejected"
            disabled={busy}
            className="rounded-md border border-fail px-3 py-1.5 text-sm font-medium text-fail hover:bg-fail-wash disabled:opacity-60"
          >
            <span aria-hidden="true">✕ </span>Reject
          </button>
        ) : null}
        {busy ? <span className="self-center text-sm text-ink-soft">Saving…</span> : null}
      </div>
    </fetcher.Form>
  );
}
