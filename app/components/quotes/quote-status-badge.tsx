// A quote's status in a word and an icon; the colour only repeats what the word says.
import { STATUS_LABELS, type QuoteStatus } from "~/domain/quotes/quote-status";

const LOOK: Record<QuoteStatus, { icon: string; className: string }> = {
  draft: { icon: "✎", className: "border-rule bg-paper text-ink-soft" },
  sent: { icon: "✉", className: "border-copper bg-sheet text-copper-dark" },
  viewed: { icon: "◉", className: "border-copper bg-sheet text-copper-dark" },
  approved: { icon: "✓", className: "border-pass bg-pass-wash text-pass" },
  declined: { icon: "✕", className: "border-fail bg-fail-wash text-fail" },
  expired: { icon: "⌛", className: "border-warn bg-warn-wash text-warn" },
  withdrawn: { icon: "↩", className: "border-rule bg-paper text-ink-soft" },
  deposit_paid: { icon: "★", className: "border-pass bg-pass-wash text-pass" },
};

export function QuoteStatusBadge({ status }: { status: QuoteStatus }) {
  const look = LOOK[status];
  return (
    <span
      data-testid="quote-status"
      className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs font-semibold whitespace-nowrap ${look.className}`}
    >
      <span aria-hidden="true">{look.icon}</span>
      {STATUS_LABELS[status]}
    </span>
  );
}
