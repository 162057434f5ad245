// Each approved reading's power at STC against the nameplate (solid line) and the verified median
// (dashed line). Readings whose irradiance was estimated from a clear-sky model, not measured, are
// drawn hollow.
import { CartesianGrid, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import type { ReadingPoint } from "~/lib/catalogue-types";

function dateLabel(ms: number) {
  return new Date(ms).toISOString().slice(0, 10);
}

export function ReadingsChart({ points, nameplateW, verifiedW }: { points: ReadingPoint[]; nameplateW: number; verifiedW: number | null }) {
  const measured = points.filter((p) => p.irradianceSource !== "clear-sky-estimate").map((p) => ({ t: Date.parse(p.takenAt), w: p.stcPmaxW }));
  const estimated = points.filter((p) => p.irradianceSource === "clear-sky-estimate").map((p) => ({ t: Date.parse(p.takenAt), w: p.stcPmaxW }));
  return (
    <div
      className="graph-paper h-80 w-full rounded-lg border border-rule p-2"
      role="img"
      aria-label={`Chart of ${points.length} approved readings at STC against the nameplate ${nameplateW} W`}
      data-testid="readings-chart"
      data-points={points.length}
    >
      <ResponsiveContainer width="100%" height="100%">
        <ScatterChart margin={{ top: 16, right: 24, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#d9cfbd" strokeDasharray="2 4" />
          <XAxis
            type="number"
            dataKey="t"
            name="Taken"
            domain={["dataMin - 86400000", "dataMax + 86400000"]}
            tickFormatter={dateLabel}
            tick={{ fill: "#4a5062", fontSize: 11 }}
            scale="time"
          />
          <YAxis
            type="number"
            dataKey="w"
            name="Power at STC"
            unit=" W"
            domain={["auto", "auto"]}
            allowDecimals={false}
            tick={{ fill: "#4a5062", fontSize: 11 }}
            width={64}
          />
          <Tooltip
            cursor={{ strokeDasharray: "3 3" }}
            formatter={(value, name) => (name === "Taken" ? dateLabel(Number(value)) : `${Number(value).toFixed(1)} W`)}
          />
          <ReferenceLine
            y={nameplateW}
            ifOverflow="extendDomain"
            stroke="#1d2333"
            strokeWidth={1.5}
            label={{ value: `nameplate ${nameplateW} W`, position: "insideTopLeft", fill: "#1d2333", fontSize: 11 }}
          />
          {verifiedW !== null ? (
            <ReferenceLine
              y={verifiedW}
              ifOverflow="extendDomain"
              stroke="#a4532a"
              strokeDasharray="6 4"
              label={{ value: `verified ${verifiedW.toFixed(1)} W`, position: "insideBottomRight", fill: "#a4532a", fontSize: 11 }}
            />
          ) : null}
          <Scatter name="Measured irradiance" data={measured} fill="#1d2333" isAnimationActive={false} />
          <Scatter name="Estimated irradiance" data={estimated} fill="#fffcf6" stroke="#1d2333" isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </div>
  );
}
