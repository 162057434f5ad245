// Monthly plane-of-array irradiation (bars), energy per module per day and daytime cell temperature.
import { Bar, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { MonthlyYield } from "~/domain/solar/yield-types";
import { MONTH_NAMES } from "~/lib/yield-form";

export function YieldChart({ months }: { months: MonthlyYield[] }) {
  const rows = months.map((m) => ({
    month: MONTH_NAMES[m.month - 1],
    poa: Number(m.poaKWhM2Day.toFixed(2)),
    energy: Math.round(m.energyWhPerDay),
    cellTemp: m.cellTempDaytimeC === null ? null : Number(m.cellTempDaytimeC.toFixed(1)),
  }));
  return (
    <div
      className="graph-paper h-80 w-full rounded-lg border border-rule p-2"
      role="img"
      aria-label="Chart of plane-of-array irradiation, energy per module per day and cell temperature by month"
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={rows} margin={{ top: 10, right: 10, bottom: 0, left: 0 }}>
          <CartesianGrid stroke="#d9cfbd" strokeDasharray="2 4" />
          <XAxis dataKey="month" tick={{ fill: "#4a5062", fontSize: 12 }} />
          <YAxis
            yAxisId="energy"
            tick={{ fill: "#4a5062", fontSize: 12 }}
            label={{ value: "Wh/day per module", angle: -90, position: "insideLeft", fill: "#4a5062", fontSize: 11 }}
          />
          <YAxis
            yAxisId="poa"
            orientation="right"
            tick={{ fill: "#4a5062", fontSize: 12 }}
            label={{ value: "kWh/m²/day · °C", angle: 90, position: "insideRight", fill: "#4a5062", fontSize: 11 }}
          />
          <Tooltip />
          <Legend />
          <Bar yAxisId="poa" dataKey="poa" name="Plane-of-array irradiation (kWh/m²/day)" fill="#e3c9b3" stroke="#a4532a" isAnimationActive={false} />
          <Line
            yAxisId="energy"
            dataKey="energy"
            name="Energy per module (Wh/day)"
            stroke="#1d2333"
            strokeWidth={2.5}
            dot={{ r: 3 }}
            isAnimationActive={false}
          />
          <Line
            yAxisId="poa"
            dataKey="cellTemp"
            name="Daytime cell temperature (°C)"
            stroke="#2f6b45"
            strokeDasharray="5 3"
            dot={false}
            isAnimationActive={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
