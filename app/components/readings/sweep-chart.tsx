// A measured load sweep: current (I–V) and power (P–V) against voltage, with the maximum power point.
import { CartesianGrid, ComposedChart, Legend, Line, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { niceTicks, thinPoints } from "~/lib/thin-points";

export interface SweepChartProps {
  points: { voltageV: number; currentA: number }[];
  mpp?: { vmpV: number; impA: number; pmaxW: number } | null;
  height?: number;
  compact?: boolean;
}

const AXIS_TICK = { fill: "#4a5062", fontSize: 11 };

export function SweepChart({ points, mpp, height = 260, compact = false }: SweepChartProps) {
  const rows = thinPoints(
    [...points].sort((a, b) => a.voltageV - b.voltageV),
    compact ? 150 : 600,
  ).map((p) => ({
    voltageV: Number(p.voltageV.toFixed(3)),
    currentA: Number(p.currentA.toFixed(4)),
    powerW: Number((p.voltageV * p.currentA).toFixed(2)),
  }));
  const voltageTicks = niceTicks(Math.max(...rows.map((r) => r.voltageV), 0));
  const currentTicks = niceTicks(Math.max(...rows.map((r) => r.currentA), 0));
  const powerTicks = niceTicks(Math.max(...rows.map((r) => r.powerW), mpp?.pmaxW ?? 0));
  return (
    <div
      className="graph-paper w-full rounded-lg border border-rule p-1"
      style={{ height }}
      role="img"
      aria-label={`Load sweep of ${points.length} points: current and power against voltage${mpp ? `, maximum ${mpp.pmaxW.toFixed(1)} W at ${mpp.vmpV.toFixed(2)} V` : ""}`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={rows} margin={{ top: 8, right: compact ? 4 : 12, bottom: compact ? 0 : 14, left: compact ? -12 : 4 }}>
          <CartesianGrid stroke="#d9cfbd" strokeDasharray="2 4" />
          <XAxis
            dataKey="voltageV"
            type="number"
            domain={[0, voltageTicks[voltageTicks.length - 1]]}
            ticks={voltageTicks}
            tick={AXIS_TICK}
            label={compact ? undefined : { value: "Voltage (V)", position: "insideBottom", offset: -8, fill: "#4a5062", fontSize: 11 }}
          />
          <YAxis
            yAxisId="current"
            domain={[0, currentTicks[currentTicks.length - 1]]}
            ticks={currentTicks}
            tick={AXIS_TICK}
            label={compact ? undefined : { value: "Current (A)", angle: -90, position: "insideLeft", fill: "#4a5062", fontSize: 11 }}
          />
          <YAxis
            yAxisId="power"
            orientation="right"
            domain={[0, powerTicks[powerTicks.length - 1]]}
            ticks={powerTicks}
            tick={AXIS_TICK}
            label={compact ? undefined : { value: "Power (W)", angle: 90, position: "insideRight", fill: "#4a5062", fontSize: 11 }}
          />
          {compact ? null : <Tooltip formatter={(value, name) => [value, name]} labelFormatter={(v) => `${v} V`} />}
          {compact ? null : <Legend verticalAlign="top" height={24} />}
          <Line yAxisId="current" dataKey="currentA" name="Current (A)" stroke="#1d2333" strokeWidth={2} dot={false} isAnimationActive={false} />
          <Line
            yAxisId="power"
            dataKey="powerW"
            name="Power (W)"
            stroke="#a4532a"
            strokeWidth={2}
            strokeDasharray="5 3"
            dot={false}
            isAnimationActive={false}
          />
          {mpp ? <ReferenceDot yAxisId="power" x={Number(mpp.vmpV.toFixed(3))} y={Number(mpp.pmaxW.toFixed(2))} r={5} fill="#a4532a" stroke="#fffcf6" /> : null}
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
