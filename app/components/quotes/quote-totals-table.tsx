// Net, tax per rate, total, deposit and balance: the figures the customer signs for.
import type { ReactNode } from "react";
import { formatMoney, money } from "~/domain/money/money";

export interface TotalsFigures {
  currency: string;
  net: string;
  taxBands: { ratePct: string; net: string; tax: string }[];
  gross: string;
  depositPct: string;
  deposit: string;
}

function Row({ label, value, strong }: { label: ReactNode; value: string; strong?: boolean }) {
  return (
    <tr className={strong ? "border-t border-ink font-semibold" : ""}>
      <th scope="row" className="py-1 pr-4 text-left font-normal">
        {label}
      </th>
      <td className="py-1 text-right tabular-nums">{value}</td>
    </tr>
  );
}

export function QuoteTotalsTable({ figures }: { figures: TotalsFigures }) {
  const m = (amount: string) => formatMoney(money(amount, figures.currency));
  const balance = money(figures.gross, figures.currency).amount.minus(figures.deposit).toFixed();
  return (
    <table className="ml-auto w-full max-w-sm text-sm" data-testid="quote-totals">
      <tbody>
        <Row label="Net" value={m(figures.net)} />
        {figures.taxBands.map((b) => (
          <Row key={b.ratePct} label={`Tax at ${b.ratePct} % on ${m(b.net)}`} value={m(b.tax)} />
        ))}
        <Row label="Total" value={m(figures.gross)} strong />
        <Row label={`Deposit on approval (${figures.depositPct} %)`} value={m(figures.deposit)} />
        <Row label="Balance on handover" value={m(balance)} />
      </tbody>
    </table>
  );
}
