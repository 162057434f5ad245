// Month by month: the chosen array's energy a day (bars) against the load (line) and what the array must
// deliver with the battery's losses and the design margin (dashed line). The design month is named in
// words — on the chart and in the caption — not by colour alone.
import { Bar, CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { KitPlan } from "~/domain/sizing/plan-types";
import { MONTH_NAMES, MONTH_SHORT, formatNumber } from "~/lib/plan-format";
import { skyAssumptionOfMonths, skyAssumptionSentence } from "~/domain/solar/sky-assumption";

const INK_SOFT = "#4a5062";

/** Legend words in ink: the pale bar colour alone would leave its name hard to read. */
export function legendText(value: string) {
  return <span style={{ color: "#1d2333" }}>{value}</span>;
}

export function EnergyVsLoadChart({ plan }: { plan: KitPlan }) {
  const { array } = plan;
  const rows = array.months.map((m) => ({
    month: MONTH_SHORT[m.month - 1],
    array: Math.round(m.arrayWhPerDay),
    load: Math.round(m.loadWhPerDay),
    required: Math.round(m.requiredArrayWhPerDay),
  }));
  const designName = array.designMonth === null ? null : MONTH_NAMES[array.designMonth - 1];
  const design = array.designMonth === null ? null : array.months[array.designMonth - 1];
  const summary =
    design && designName
      ? `Design month ${designName}: the ${array.layout.moduleCount}-module array gives ${formatNumber(design.arrayWhPerDay)} Wh/day against ${formatNumber(design.loadWhPerDay)} Wh/day of load and ${formatNumber(design.requiredArrayWhPerDay)} Wh/day required with the margin.`
      : "There is no load, so no month sets the array's size.";
  const sky = skyAssumptionOfMonths(plan.moduleYield?.months);
  return (
    <figure>
      <div
        className="graph-paper h-80 w-full rounded-lg border border-rule p-2"
        role="img"
        aria-label={`Chart of the array's energy a day against the load and the required energy, by month. ${summary}`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 22, right: 8, bottom: 0, left: 4 }}>
            <CartesianGrid stroke="#d9cfbd" strokeDasharray="2 4" />
            <XAxis dataKey="month" tick={{ fill: INK_SOFT, fontSize: 12 }} interval="preserveStartEnd" minTickGap={4} />
            <YAxis
              tick={{ fill: INK_SOFT, fontSize: 12 }}
              width={56}
              label={{ value: "Wh/day", angle: -90, position: "insideLeft", fill: INK_SOFT, fontSize: 11 }}
            />
            <Tooltip formatter={(value) => `${formatNumber(Number(value))} Wh/day`} />
            <Legend wrapperStyle={{ fontSize: 12 }} formatter={legendText} />
            {design ? (
              <ReferenceLine
                x={MONTH_SHORT[design.month - 1]}
                stroke="#7f3d1c"
                strokeDasharray="3 3"
                label={{ value: "▼ design month", position: "top", fill: "#7f3d1c", fontSize: 11 }}
              />
            ) : null}
            <Bar dataKey="array" name="Array energy (Wh/day)" fill="#e3c9b3" stroke="#a4532a" isAnimationActive={false} />
            <Line dataKey="load" name="Load (Wh/day)" stroke="#1d2333" strokeWidth={2.5} dot={{ r: 3 }} isAnimationActive={false} />
            <Line
              dataKey="required"
              name="Required with margin (Wh/day)"
              stroke="#1d2333"
              strokeWidth={1.5}
              strokeDasharray="6 4"
              legendType="plainline"
              dot={false}
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft" data-testid="energy-chart-caption">
        {summary} Array energy: to the battery on the month's average day, after losses and shade. Required: the load ÷ the battery's round-trip efficiency,
        plus the design margin.
        {sky ? (
          <span className="mt-1 block font-medium text-warn" data-testid="energy-chart-sky">
            <span aria-hidden="true">⚠ </span>
            {skyAssumptionSentence(sky)}
          </span>
        ) : null}
      </figcaption>
    </figure>
  );
}
