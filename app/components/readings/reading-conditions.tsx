// The conditions of a reading as the installer gave them, with the figures read from the sweep.
export interface ConditionsView {
  kind: "single" | "sweep";
  vmpV: number | null;
  impA: number | null;
  vocV: number | null;
  iscA: number | null;
  fillFactor: number | null;
  sweep: unknown[] | null;
  sweepDurationS: number | null;
  latitudeDeg: number;
  longitudeDeg: number;
  tiltDeg: number;
  azimuthDeg: number;
  airTempC: number;
  moduleTempC: number | null;
  instrument: string;
  method: string;
}

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="grid grid-cols-[10rem_1fr] gap-2 border-b border-rule py-1.5 text-sm last:border-0">
      <dt className="text-ink-soft">{label}</dt>
      <dd className="figures">{children}</dd>
    </div>
  );
}

const fixed = (value: number | null, digits: number, unit: string) => (value === null ? "—" : `${value.toFixed(digits)} ${unit}`);

export function ReadingConditions({ reading: r }: { reading: ConditionsView }) {
  return (
    <dl>
      <Row label="Measured as">
        {r.kind === "sweep"
          ? `a load sweep of ${r.sweep?.length ?? 0} points${r.sweepDurationS !== null ? ` over ${r.sweepDurationS.toFixed(2)} s` : ""}`
          : "one reading"}
      </Row>
      {r.kind === "sweep" ? (
        <Row label="From the sweep">
          Vmp {fixed(r.vmpV, 2, "V")} · Imp {fixed(r.impA, 2, "A")} · Voc {fixed(r.vocV, 2, "V")} · Isc {fixed(r.iscA, 2, "A")} · FF{" "}
          {r.fillFactor?.toFixed(3) ?? "—"}
        </Row>
      ) : r.vmpV !== null ? (
        <Row label="Operating point">
          {fixed(r.vmpV, 2, "V")} × {fixed(r.impA, 2, "A")}
        </Row>
      ) : null}
      <Row label="Place">
        {Math.abs(r.latitudeDeg).toFixed(4)}° {r.latitudeDeg < 0 ? "S" : "N"}, {Math.abs(r.longitudeDeg).toFixed(4)}° {r.longitudeDeg < 0 ? "W" : "E"}
      </Row>
      <Row label="Module tilt, azimuth">
        {r.tiltDeg.toFixed(0)}°, facing {r.azimuthDeg.toFixed(0)}° (compass)
      </Row>
      <Row label="Air temperature">{fixed(r.airTempC, 1, "°C")}</Row>
      <Row label="Back-sheet temperature">{r.moduleTempC === null ? "not measured" : fixed(r.moduleTempC, 1, "°C")}</Row>
      <Row label="Instruments">
        <span className="font-sans">{r.instrument}</span>
      </Row>
      <Row label="Method">
        <span className="whitespace-pre-line font-sans">{r.method}</span>
      </Row>
    </dl>
  );
}
