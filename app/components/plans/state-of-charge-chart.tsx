// The simulated year, day by day: the battery's state of charge at the end of each day, with every day
// on which the load went unmet marked on the baseline and named in the legend and the caption.
import { Area, CartesianGrid, ComposedChart, Legend, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import type { YearSimulation } from "~/domain/sizing/year-simulation";
import { MONTH_NAMES, MONTH_SHORT, dayLabel, formatNumber, monthStartDays, plural } from "~/lib/plan-format";

const INK_SOFT = "#4a5062";

export function StateOfChargeChart({
  simulation,
  depthOfDischargePct,
}: {
  simulation: YearSimulation;
  /** The bank's depth of discharge (KitPlan.battery.effectiveDodPct): draws the floor the charge stops at. */
  depthOfDischargePct?: number;
}) {
  const { days } = simulation;
  // Day numbers from 1 so the axis reads as days of the year.
  const rows = days.stateOfChargePct.map((soc, i) => ({ day: i + 1, soc: Number(soc.toFixed(1)) }));
  const unmet = days.unmetWh.flatMap((wh, i) => (wh > 0 ? [{ day: i + 1, marker: 0, unmetWh: Math.round(wh) }] : []));
  const ticks = monthStartDays(days.month).map((s) => s.dayIndex + 1);
  const monthAtDay = new Map(monthStartDays(days.month).map((s) => [s.dayIndex + 1, s.month]));
  const worstMonths = simulation.months.filter((m) => m.unmetDays > 0).map((m) => `${m.unmetDays} in ${MONTH_NAMES[m.month - 1]}`);
  const floorPct = depthOfDischargePct === undefined ? null : 100 - depthOfDischargePct;
  const summary =
    simulation.unmetDays === 0
      ? `The load was met on every day of the simulated year; the lowest state of charge was ${formatNumber(simulation.minStateOfChargePct)} %.`
      : `Unmet load on ${simulation.unmetDays} ${plural(simulation.unmetDays, "day")} of the simulated year (${worstMonths.join(", ")}); the lowest state of charge was ${formatNumber(simulation.minStateOfChargePct)} %.`;
  return (
    <figure>
      <div
        className="graph-paper h-72 w-full rounded-lg border border-rule p-2"
        role="img"
        aria-label={`Chart of the battery's state of charge through a simulated year. ${summary}`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 10, right: 8, bottom: 0, left: 4 }}>
            <CartesianGrid stroke="#d9cfbd" strokeDasharray="2 4" />
            <XAxis
              dataKey="day"
              type="number"
              domain={[1, days.stateOfChargePct.length]}
              ticks={ticks}
              tickFormatter={(day: number) => MONTH_SHORT[(monthAtDay.get(day) ?? 1) - 1]}
              tick={{ fill: INK_SOFT, fontSize: 12 }}
            />
            <YAxis
              domain={[0, 100]}
              ticks={[0, 25, 50, 75, 100]}
              tick={{ fill: INK_SOFT, fontSize: 12 }}
              width={48}
              label={{ value: "State of charge %", angle: -90, position: "insideLeft", fill: INK_SOFT, fontSize: 11, dy: 50 }}
            />
            <Tooltip
              labelFormatter={(day) => dayLabel(days.month, Number(day) - 1)}
              formatter={(value, name) => (name === "Day with unmet load" ? "load not met" : `${formatNumber(Number(value))} %`)}
            />
            <Legend wrapperStyle={{ fontSize: 12 }} formatter={(value: string) => <span style={{ color: "#1d2333" }}>{value}</span>} />
            {floorPct !== null ? (
              <ReferenceLine
                y={floorPct}
                stroke="#a12b2b"
                strokeDasharray="4 3"
                label={{ value: `depth-of-discharge floor ${formatNumber(floorPct)} %`, position: "insideBottomRight", fill: "#a12b2b", fontSize: 11 }}
              />
            ) : null}
            <Area
              dataKey="soc"
              name="State of charge (%)"
              type="linear"
              stroke="#1d2333"
              strokeWidth={1.5}
              fill="#e3c9b3"
              fillOpacity={0.6}
              dot={false}
              isAnimationActive={false}
            />
            <Scatter data={unmet} dataKey="marker" name="Day with unmet load" fill="#a12b2b" shape="triangle" legendType="triangle" isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft" data-testid="soc-chart-caption">
        {summary} State of charge at the end of each day, from a simulated year of daily weather (seed {formatNumber(simulation.seed, 0, false)}); ▲ marks a day
        with unmet load.
      </figcaption>
    </figure>
  );
}
