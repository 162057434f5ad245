// Under a failing safety check: accept it anyway, with a reason that stays with the revision.
import { Form } from "react-router";

export function OverrideForm({ checkId, error }: { checkId: string; error?: string }) {
  return (
    <details className="mt-2 text-sm">
      <summary className="cursor-pointer text-ink-soft">Accept this failure with a reason…</summary>
      <Form method="post" className="mt-2 space-y-2">
        <input type="hidden" name="intent" value="override" />
        <input type="hidden" name="checkId" value={checkId} />
        <label htmlFor={`reason-${checkId}`} className="block">
          Why is it acceptable here? (kept with the plan, shown on the quote's record)
        </label>
        <textarea
          id={`reason-${checkId}`}
          name="reason"
          rows={2}
          required
          minLength={10}
          maxLength={1000}
          className="w-full rounded-md border border-rule bg-sheet p-2"
        />
        {error ? <p className="text-fail">✕ {error}</p> : null}
        <button type="submit" className="rounded-md border border-fail px-3 py-1 text-fail">
          Accept with this reason
        </button>
      </Form>
    </details>
  );
}
