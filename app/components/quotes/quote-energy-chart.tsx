// Month by month, what the kit delivers on an average day against what the customer's loads use.
import { Bar, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { legendText } from "~/components/plans/energy-vs-load-chart";
import type { SnapshotMonth } from "~/domain/quotes/quote-types";
import { MONTH_SHORT, formatNumber } from "~/lib/plan-format";

export function QuoteEnergyChart({ months }: { months: SnapshotMonth[] }) {
  const rows = months.map((m) => ({ month: MONTH_SHORT[m.month - 1], kit: m.arrayKWhPerDay, loads: m.loadKWhPerDay }));
  const worst = months.reduce((a, b) => (b.arrayKWhPerDay - b.loadKWhPerDay < a.arrayKWhPerDay - a.loadKWhPerDay ? b : a), months[0]);
  const summary = worst
    ? `In the leanest month, ${MONTH_SHORT[worst.month - 1]}, the kit gives about ${formatNumber(worst.arrayKWhPerDay, 2)} kWh a day for ${formatNumber(worst.loadKWhPerDay, 2)} kWh of use.`
    : "";
  return (
    <figure className="break-inside-avoid">
      <div
        className="graph-paper h-64 w-full rounded-lg border border-rule p-2"
        role="img"
        aria-label={`Expected energy per day by month against your loads. ${summary}`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 10, right: 8, bottom: 0, left: 4 }}>
            <CartesianGrid stroke="#d9cfbd" strokeDasharray="2 4" />
            <XAxis dataKey="month" tick={{ fill: "#4a5062", fontSize: 11 }} interval={0} />
            <YAxis
              tick={{ fill: "#4a5062", fontSize: 11 }}
              width={44}
              label={{ value: "kWh/day", angle: -90, position: "insideLeft", fill: "#4a5062", fontSize: 11 }}
            />
            <Legend wrapperStyle={{ fontSize: 12 }} formatter={legendText} />
            <Bar dataKey="kit" name="Kit delivers (kWh/day)" fill="#e3c9b3" stroke="#a4532a" isAnimationActive={false} />
            <Line dataKey="loads" name="Your loads use (kWh/day)" stroke="#1d2333" strokeWidth={2.5} dot={{ r: 3 }} isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-xs text-ink-soft">
        {summary} Figures for an average day of each month, from the site's climate and the kit plan.
      </figcaption>
    </figure>
  );
}
