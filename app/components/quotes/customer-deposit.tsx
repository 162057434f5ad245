// After approval: pay the deposit by card (on the payment provider's page), and what happened last.
import { useEffect } from "react";
import { Form, useNavigation, useRevalidator } from "react-router";
import { FormErrors } from "~/components/form-field";
import { Panel } from "~/components/page-header";

export function CustomerDeposit({
  deposit,
  returned,
  lastFailure,
  message,
}: {
  deposit: string;
  returned: "done" | "cancelled" | null;
  lastFailure: string | null;
  message: string | null;
}) {
  const busy = useNavigation().state !== "idle";
  const revalidator = useRevalidator();
  // Back from a successful payment before its webhook was recorded: look again every two seconds.
  useEffect(() => {
    if (returned !== "done") return;
    const timer = setInterval(() => revalidator.revalidate(), 2000);
    return () => clearInterval(timer);
  }, [returned, revalidator]);
  return (
    <Panel title="Pay the deposit">
      <div className="space-y-3" data-testid="deposit-panel">
        <FormErrors errors={message ? [message] : undefined} />
        {returned === "done" ? <p role="status">⏳ Your payment is being confirmed by the card processor; this page updates by itself.</p> : null}
        {returned !== "done" && lastFailure ? (
          <p role="alert" className="text-fail">
            ✕ Your last card payment did not go through: {lastFailure} Nothing was charged. Try again, or use another card.
          </p>
        ) : null}
        {returned === "cancelled" && !lastFailure ? <p role="status">You left the payment page before paying. Nothing was charged.</p> : null}
        <Form method="post">
          <input type="hidden" name="intent" value="pay" />
          <button type="submit" disabled={busy} className="rounded-md bg-copper px-5 py-2.5 font-medium text-sheet hover:bg-copper-dark disabled:opacity-60">
            {busy ? "Opening the payment page…" : `Pay deposit of ${deposit} by card`}
          </button>
        </Form>
        <p className="text-xs text-ink-faint">You pay on the card processor's secure page; Kitwright never sees your card number.</p>
      </div>
    </Panel>
  );
}
