// Money on the page: always with its currency; a converted amount also says what it was converted
// from, at which rate and from which day. Amounts arrive as exact decimal text.
import Decimal from "decimal.js";
import { minorDigits } from "~/domain/money/money";
import type { MoneyText, RateText } from "~/domain/sourcing/comparison-rows";

/** "EUR 1,234.50"; `extraDigits` for small per-unit figures such as price per watt ("EUR 0.390"). */
export function formatAmount(m: MoneyText, extraDigits = 0): string {
  const digits = minorDigits(m.currency) + extraDigits;
  const fixed = new Decimal(m.amount).toFixed(digits, Decimal.ROUND_HALF_UP);
  const negative = fixed.startsWith("-");
  const [whole, fraction] = fixed.replace("-", "").split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return `${m.currency} ${negative ? "−" : ""}${grouped}${fraction ? `.${fraction}` : ""}`;
}

export function formatRate(rate: RateText): string {
  return `1 ${rate.from} = ${new Decimal(rate.rate).toDecimalPlaces(6).toFixed()} ${rate.to}, rate of ${rate.asOf}`;
}

export function RateNote({ rate }: { rate: RateText | null }) {
  if (!rate) return null;
  return <span className="ml-auto block max-w-40 text-xs text-ink-faint">at {formatRate(rate)}</span>;
}

export function MoneyFigure({
  value,
  extraDigits = 0,
  unit,
  original,
  rate,
  testId,
}: {
  value: MoneyText | null;
  extraDigits?: number;
  unit?: string;
  original?: MoneyText;
  rate?: RateText | null;
  testId?: string;
}) {
  if (!value) return <span className="text-xs text-ink-faint">—</span>;
  return (
    <span className="figures whitespace-nowrap" data-testid={testId} data-amount={value.amount}>
      {formatAmount(value, extraDigits)}
      {unit ? <span className="text-ink-soft"> {unit}</span> : null}
      {original && rate ? <span className="block text-xs text-ink-faint">from {formatAmount(original, extraDigits)}</span> : null}
    </span>
  );
}

export function MissingRate({ message }: { message: string }) {
  return (
    <span className="block text-xs text-warn">
      <span aria-hidden="true">⚠</span> {message}
    </span>
  );
}
