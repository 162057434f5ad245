// Deposit payments on the quote: each card payment attempt and how it ended.
import { Panel } from "~/components/page-header";
import { formatMoney, money } from "~/domain/money/money";
import { formatDate } from "~/lib/plan-format";

const WORDS = { open: "Waiting for the card", paid: "✓ Paid", failed: "✕ Failed", expired: "⌛ Expired" } as const;

export interface PaymentRow {
  id: string;
  amount: string;
  currency: string;
  status: keyof typeof WORDS;
  failure_message: string | null;
  created_at: Date | string;
  paid_at: Date | string | null;
}

export function QuotePayments({ payments }: { payments: PaymentRow[] }) {
  if (!payments.length) return null;
  return (
    <Panel title="Deposit payments">
      <ul className="space-y-2 text-sm" data-testid="quote-payments">
        {payments.map((p) => (
          <li key={p.id}>
            <span className="font-semibold">{WORDS[p.status]}</span> · {formatMoney(money(p.amount, p.currency))}
            <span className="block text-ink-soft">
              {p.paid_at ? `paid ${formatDate(p.paid_at)}` : `started ${formatDate(p.created_at)}`}
              {p.failure_message ? ` — ${p.failure_message}` : ""}
            </span>
          </li>
        ))}
      </ul>
    </Panel>
  );
}
