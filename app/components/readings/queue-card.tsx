// One pending reading in the curator's queue.
import { Link } from "react-router";
import { DecisionForm } from "./decision-form";
import { FlagList } from "./flag-list";
import { SweepChart } from "./sweep-chart";
import { IRRADIANCE_SOURCE_LABEL, pct } from "~/lib/reading-labels";

export interface QueueReading {
  id: string;
  kind: "single" | "sweep";
  maker: string;
  model: string;
  nameplatePmaxW: number;
  stcPmaxW: number;
  measuredPmaxW: number;
  uncertaintyPct: number;
  weight: number;
  irradianceSource: keyof typeof IRRADIANCE_SOURCE_LABEL;
  irradianceWm2: number;
  cellTempC: number;
  moduleTempC: number | null;
  flags: { code: string; message: string }[];
  takenAtText: string;
  submittedAt: string;
  submitterName: string | null;
  teamName: string | null;
  photoId: string | null;
  sweep: { voltageV: number; currentA: number }[] | null;
  mpp: { vmpV: number; impA: number; pmaxW: number } | null;
  outlier: { z: number | null; approvedCount: number; isOutlier: boolean };
}

function OutlierScore({ outlier }: { outlier: QueueReading["outlier"] }) {
  if (outlier.z === null) {
    return <span className="text-ink-faint">no score yet ({outlier.approvedCount} approved; 3 needed)</span>;
  }
  const z = `${outlier.z >= 0 ? "+" : ""}${outlier.z.toFixed(1)}`;
  return outlier.isOutlier ? (
    <span className="font-medium text-fail">
      <span aria-hidden="true">⚑ </span>outlier, z = {z}
    </span>
  ) : (
    <span className="text-pass">
      <span aria-hidden="true">✓ </span>typical, z = {z}
    </span>
  );
}

export function QueueCard({ reading: r }: { reading: QueueReading }) {
  const clear = r.flags.length === 0 && !r.outlier.isOutlier;
  return (
    <article className="rounded-xl border border-rule bg-sheet p-4 shadow-sm" aria-label={`Reading of the ${r.maker} ${r.model}`}>
      <header className="mb-3 flex flex-wrap items-start justify-between gap-2">
        <div className="flex items-start gap-3">
          <input
            type="checkbox"
            form="bulk-form"
            name="readingIds"
            value={r.id}
            data-clear={clear ? "true" : "false"}
            aria-label={`Tick the reading of the ${r.maker} ${r.model} for a bulk decision`}
            className="mt-1.5 size-4"
          />
          <div>
            <h2 className="text-lg font-semibold">
              <Link to={`/readings/${r.id}`} className="underline">
                {r.maker} {r.model}
              </Link>
            </h2>
            <p className="text-sm text-ink-soft">
              {r.kind === "sweep" ? "Load sweep" : "One reading"} taken {r.takenAtText} · by {r.submitterName ?? "a former user"}
              {r.teamName ? ` (${r.teamName})` : ""} · waiting since {r.submittedAt.slice(0, 10)}
            </p>
          </div>
        </div>
      </header>
      <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_14rem]">
        <div className="space-y-3">
          <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
            <div>
              <dt className="text-xs text-ink-faint">At STC</dt>
              <dd className="figures text-lg font-semibold">
                {r.stcPmaxW.toFixed(1)} W <span className="text-sm font-normal text-ink-soft">± {r.uncertaintyPct.toFixed(1)} %</span>
              </dd>
            </div>
            <div>
              <dt className="text-xs text-ink-faint">Of nameplate</dt>
              <dd className="figures text-lg font-semibold">
                {pct(r.stcPmaxW / r.nameplatePmaxW)} <span className="text-sm font-normal text-ink-soft">of {r.nameplatePmaxW} W</span>
              </dd>
            </div>
            <div>
              <dt className="text-xs text-ink-faint">Irradiance</dt>
              <dd className="figures">
                {r.irradianceWm2.toFixed(0)} W/m² <span className="block font-sans text-xs text-ink-soft">{IRRADIANCE_SOURCE_LABEL[r.irradianceSource]}</span>
              </dd>
            </div>
            <div>
              <dt className="text-xs text-ink-faint">Cell temperature</dt>
              <dd className="figures">
                {r.cellTempC.toFixed(1)} °C{" "}
                <span className="block font-sans text-xs text-ink-soft">{r.moduleTempC === null ? "estimated from air" : "from back sheet"}</span>
              </dd>
            </div>
          </dl>
          <p className="text-sm">
            <span className="text-ink-soft">Against approved readings: </span>
            <OutlierScore outlier={r.outlier} />
            <span className="text-ink-soft"> · weight {r.weight.toFixed(1)}</span>
          </p>
          <FlagList flags={r.flags} />
          {r.sweep ? <SweepChart points={r.sweep} mpp={r.mpp} height={170} compact /> : null}
        </div>
        <div className="space-y-3">
          {r.photoId ? (
            <a href={`/files/${r.photoId}`} target="_blank" rel="noreferrer" className="block">
              <img
                src={`/files/${r.photoId}`}
                alt={`Evidence photo: ${r.maker} ${r.model}`}
                loading="lazy"
                className="max-h-48 w-full rounded-md border border-rule object-cover"
              />
            </a>
          ) : (
            <p className="text-sm text-ink-faint">No photo.</p>
          )}
          <DecisionForm readingId={r.id} action="/review" allowed={["approved", "rejected"]} />
        </div>
      </div>
    </article>
  );
}
