// The normalised result of a reading with where each input came from: used by the live preview on
// the form and by the reading's page, so the submitter sees before sending what the curator sees.
import type { UncertaintyTerm } from "~/domain/readings/reading-uncertainty";
import { CELL_TEMPERATURE_SOURCE_LABEL, IRRADIANCE_SOURCE_LABEL, pct } from "~/lib/reading-labels";

export interface ReadingResultProps {
  stcPmaxW: number;
  uncertaintyPct: number;
  nameplatePmaxW: number;
  measuredPmaxW: number;
  irradianceWm2: number;
  irradianceSource: keyof typeof IRRADIANCE_SOURCE_LABEL;
  cellTempC: number;
  cellTempSource: keyof typeof CELL_TEMPERATURE_SOURCE_LABEL;
  weight: number;
  uncertaintyTerms?: UncertaintyTerm[];
  sunElevationDeg?: number;
  incidenceDeg?: number;
}

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div>
      <dt className="text-xs uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="figures text-lg font-semibold">{value}</dd>
      {note ? <dd className="text-xs text-ink-soft">{note}</dd> : null}
    </div>
  );
}

export function ReadingResult(props: ReadingResultProps) {
  const ratio = props.stcPmaxW / props.nameplatePmaxW;
  const estimated = props.irradianceSource === "clear-sky-estimate";
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-2">
        <div>
          <p className="text-xs uppercase tracking-wide text-ink-faint">At STC (1000 W/m², 25 °C cell)</p>
          <p className="figures text-figure font-semibold" data-testid="stc-pmax">
            {props.stcPmaxW.toFixed(1)} W <span className="text-base font-normal text-ink-soft">± {props.uncertaintyPct.toFixed(1)} %</span>
          </p>
        </div>
        <p className="figures pb-1 text-ink-soft">
          {pct(ratio)} of nameplate ({props.nameplatePmaxW} W)
        </p>
      </div>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        <Figure label="Measured power" value={`${props.measuredPmaxW.toFixed(1)} W`} />
        <Figure label="In-plane irradiance" value={`${props.irradianceWm2.toFixed(0)} W/m²`} note={IRRADIANCE_SOURCE_LABEL[props.irradianceSource]} />
        <Figure label="Cell temperature" value={`${props.cellTempC.toFixed(1)} °C`} note={CELL_TEMPERATURE_SOURCE_LABEL[props.cellTempSource]} />
        {props.sunElevationDeg !== undefined ? <Figure label="Sun elevation" value={`${props.sunElevationDeg.toFixed(1)}°`} /> : null}
        {props.incidenceDeg !== undefined ? <Figure label="Angle of incidence" value={`${props.incidenceDeg.toFixed(1)}°`} /> : null}
        <Figure label="Weight" value={props.weight.toFixed(1)} note={estimated ? "estimated irradiance counts half" : "measured irradiance counts fully"} />
      </dl>
      {props.uncertaintyTerms?.length ? (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft">How the ± {props.uncertaintyPct.toFixed(1)} % is made</summary>
          <ul className="mt-2 space-y-1">
            {props.uncertaintyTerms.map((t) => (
              <li key={t.code} className="flex justify-between gap-4 border-b border-rule pb-1">
                <span>{t.label}</span>
                <span className="figures">± {t.pct.toFixed(1)} %</span>
              </li>
            ))}
          </ul>
          <p className="mt-2 text-xs text-ink-faint">
            Independent terms combined in quadrature. STC value by P·(1000/G)/(1 + γ(Tc − 25)) with the datasheet's power coefficient γ. Typical instrument
            accuracies: common practice, not a standard's figures.
          </p>
        </details>
      ) : null}
    </div>
  );
}
