// Sending, sending again and withdrawing, with what each does said beside the button.
import { Form, useNavigation } from "react-router";
import { FormErrors } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import type { QuoteStatus } from "~/domain/quotes/quote-status";

export function QuoteSendPanel({
  canSend,
  canWithdraw,
  revisionSent,
  status,
  message,
}: {
  canSend: boolean;
  canWithdraw: boolean;
  revisionSent: boolean;
  status: QuoteStatus;
  message: string | null;
}) {
  const navigation = useNavigation();
  const busy = navigation.state === "submitting" ? navigation.formData?.get("intent") : null;
  const resend = revisionSent && status !== "withdrawn";
  return (
    <Panel title="Customer">
      <div className="space-y-3 text-sm">
        <FormErrors errors={message ? [message] : undefined} />
        {canSend ? (
          <Form method="post">
            <input type="hidden" name="intent" value="send" />
            <p className="mb-2 text-ink-soft">
              {resend
                ? "E-mails the customer a fresh link to this revision (the old link stops working)."
                : "E-mails the customer a link to this revision. A new customer chooses a password on first visit. Save your changes first."}
            </p>
            <button
              type="submit"
              disabled={busy === "send"}
              className="w-full rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark disabled:opacity-60"
            >
              {busy === "send" ? "Sending…" : resend ? "Send again" : "Send to customer"}
            </button>
          </Form>
        ) : (
          <p className="text-ink-soft">
            {status === "approved"
              ? "Approved by the customer: waiting for the deposit."
              : status === "deposit_paid"
                ? "Deposit paid: the quote is settled."
                : "This quote cannot be sent now."}
          </p>
        )}
        {canWithdraw ? (
          <Form method="post" className="border-t border-rule pt-3">
            <input type="hidden" name="intent" value="withdraw" />
            <label className="mb-1 block font-medium" htmlFor="withdraw-reason">
              Withdraw (the customer can no longer open it)
            </label>
            <input
              id="withdraw-reason"
              name="reason"
              placeholder="A note for the customer (optional)"
              className="mb-2 block w-full rounded-md border border-rule bg-sheet px-3 py-1.5"
            />
            <button
              type="submit"
              disabled={busy === "withdraw"}
              className="w-full rounded-md border border-fail px-4 py-2 font-medium text-fail disabled:opacity-60"
            >
              Withdraw quote
            </button>
          </Form>
        ) : null}
      </div>
    </Panel>
  );
}
