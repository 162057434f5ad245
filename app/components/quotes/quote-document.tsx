// The quote as a document: who it is from and for, the kit in a few figures, the priced lines and
// totals, the expected energy per month against the customer's loads, the plan's checks, the safety
// cautions, the terms and how long it holds. Laid out to print cleanly on A4 from the browser.
import { BrandMark } from "~/components/brand-mark";
import { PlanCautions } from "~/components/plans/plan-cautions";
import { SkyAssumptionNote } from "~/components/sky-assumption-note";
import { formatNumber } from "~/lib/plan-format";
import type { QuoteDocumentData } from "~/lib/quote-document";
import { QuoteChecksList } from "./quote-checks-list";
import { QuoteEnergyChart } from "./quote-energy-chart";
import { QuoteLinesTable } from "./quote-lines-table";
import { QuoteTotalsTable } from "./quote-totals-table";

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd className="font-semibold tabular-nums">{value}</dd>
    </div>
  );
}

export function QuoteDocument({ doc }: { doc: QuoteDocumentData }) {
  const { plan } = doc;
  return (
    <article
      className="quote-document space-y-6 rounded-xl border border-rule bg-sheet p-6 print:border-0 print:p-0 print:shadow-none"
      data-testid="quote-document"
    >
      <header className="flex flex-wrap items-start justify-between gap-4 border-b-2 border-ink pb-4">
        <div>
          <p className="text-2xl font-semibold tracking-tight">{doc.teamName}</p>
          <p className="text-sm text-ink-soft">Off-grid solar kit quote</p>
        </div>
        <div className="text-right text-sm">
          <p className="text-xl font-semibold tabular-nums">
            {doc.number} <span className="text-base font-normal text-ink-soft">rev. {doc.revision}</span>
          </p>
          <p>Issued {doc.issuedOn}</p>
          <p className="font-semibold">Valid until {doc.validUntil}</p>
        </div>
      </header>
      <section className="grid gap-4 sm:grid-cols-2">
        <div>
          <h2 className="text-xs font-semibold tracking-wide text-ink-soft uppercase">For</h2>
          <p className="font-semibold">{doc.customerName}</p>
          <p className="text-sm">{doc.customerEmail}</p>
          <p className="mt-2 text-sm">{doc.title}</p>
        </div>
        <dl className="grid grid-cols-2 gap-3 text-sm">
          <Fact label="Site" value={plan.siteName} />
          <Fact label="System voltage" value={`${plan.systemVoltageV} V`} />
          <Fact label="Array" value={`${plan.moduleCount} modules, ${formatNumber(plan.arrayStcPowerW)} W at STC`} />
          <Fact label="Battery, usable" value={`${formatNumber(plan.batteryUsableKWh, 2)} kWh (${plan.autonomyDays} days)`} />
        </dl>
      </section>
      <section>
        <h2 className="mb-2 text-lg font-semibold">What is included</h2>
        <QuoteLinesTable lines={doc.lines} currency={doc.totals.currency} />
        <div className="mt-3">
          <QuoteTotalsTable figures={doc.totals} />
        </div>
      </section>
      <section>
        <h2 className="mb-2 text-lg font-semibold break-after-avoid">Energy you can expect</h2>
        <SkyAssumptionNote assumption={plan.skyAssumption} className="mb-2 break-inside-avoid" />
        <QuoteEnergyChart months={plan.months} />
      </section>
      <section>
        <h2 className="mb-2 text-lg font-semibold break-after-avoid">How the design was checked</h2>
        <QuoteChecksList checks={plan.checks} />
      </section>
      <div className="break-inside-avoid">
        <PlanCautions cautions={plan.cautions} />
      </div>
      <section className="break-inside-avoid text-sm">
        <h2 className="mb-1 text-lg font-semibold">Terms</h2>
        <p className="whitespace-pre-line">{doc.terms}</p>
        <p className="mt-2">
          This quote holds until {doc.validUntil}. It was priced from kit plan “{plan.planName}”, revision {plan.planRevision}.
        </p>
      </section>
      <footer className="flex items-center gap-2 border-t border-rule pt-3 text-xs text-ink-faint">
        <BrandMark size={16} title="" /> Prepared with Kitwright
      </footer>
    </article>
  );
}
