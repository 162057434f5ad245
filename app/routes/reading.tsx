// /readings/:readingId — one field reading: the result and its working, the sweep, the conditions,
// the flags, the evidence photo and every decision. Visible to the submitting team and curators;
// curators approve or reject here too.
import { Link } from "react-router";
import type { Route } from "./+types/reading";
import { PageHeader, Panel } from "~/components/page-header";
import { DecisionForm } from "~/components/readings/decision-form";
import { DecisionTimeline } from "~/components/readings/decision-timeline";
import { FlagList } from "~/components/readings/flag-list";
import { ReadingConditions } from "~/components/readings/reading-conditions";
import { ReadingResult } from "~/components/readings/reading-result";
import { StatusBadge } from "~/components/readings/status-badge";
import { SweepChart } from "~/components/readings/sweep-chart";
import { OUTLIER_Z, robustZScore } from "~/domain/catalogue/robust-stats";
import { formatReadingTime } from "~/domain/readings/reading-time";
import { handleDecisionAction } from "~/server/readings/decision-action.server";
import { approvedValuesByModule, findReadingForViewer, listDecisions } from "~/server/readings/reading-queries.server";
import { requireReadingViewer } from "~/server/readings/reading-viewer.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: data ? `Reading of the ${data.reading.maker} ${data.reading.model} · Kitwright` : "Field reading · Kitwright" },
];

export async function loader({ request, params }: Route.LoaderArgs) {
  const viewer = await requireReadingViewer(request);
  const reading = await findReadingForViewer(viewer, params.readingId);
  if (!reading) throw new Response("No such reading, or it is not shared with you.", { status: 404 });
  const [decisions, approved] = await Promise.all([listDecisions(reading.id), approvedValuesByModule([reading.module_id], [reading.id])]);
  const others = approved.get(reading.module_id) ?? [];
  const working = "method" in reading.normalisation ? reading.normalisation : null;
  return {
    isCurator: viewer.isCurator,
    reading: {
      id: reading.id,
      status: reading.status,
      kind: reading.kind,
      moduleId: reading.module_id,
      maker: reading.maker,
      model: reading.model,
      nameplatePmaxW: reading.nameplatePmaxW,
      verifiedPmaxW: reading.verifiedPmaxW,
      verifiedReadingCount: reading.verifiedReadingCount,
      submitterName: reading.submitterName,
      teamName: reading.teamName,
      createdAt: new Date(reading.created_at).toISOString(),
      takenAtText: formatReadingTime(new Date(reading.taken_at), reading.utc_offset_min),
      measuredPmaxW: reading.measured_pmax_w,
      vmpV: reading.measured_vmp_v,
      impA: reading.measured_imp_a,
      vocV: reading.measured_voc_v,
      iscA: reading.measured_isc_a,
      fillFactor: reading.fill_factor,
      sweep: reading.sweep,
      sweepDurationS: reading.sweep_duration_s,
      latitudeDeg: reading.latitude_deg,
      longitudeDeg: reading.longitude_deg,
      tiltDeg: reading.tilt_deg,
      azimuthDeg: reading.azimuth_deg,
      airTempC: reading.air_temp_c,
      moduleTempC: reading.module_temp_c,
      irradianceWm2: reading.irradiance_wm2,
      irradianceSource: reading.irradiance_source,
      instrument: reading.instrument,
      method: reading.method,
      photoId: reading.photo_id,
      cellTempC: reading.cell_temp_c,
      stcPmaxW: reading.stc_pmax_w,
      uncertaintyPct: reading.uncertainty_pct,
      weight: reading.weight,
      flags: reading.flags,
      working,
    },
    outlier: { z: robustZScore(reading.stc_pmax_w, others), approvedCount: others.length },
    decisions: decisions.map((d) => ({ ...d, decidedAt: new Date(d.decidedAt).toISOString() })),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  return handleDecisionAction(request, { redirectTo: () => `/readings/${params.readingId}`, onlyPending: false });
}

export default function ReadingPage({ loaderData }: Route.ComponentProps) {
  const { reading: r, decisions, isCurator, outlier } = loaderData;
  const allowed = r.status === "pending" ? (["approved", "rejected"] as const) : r.status === "approved" ? (["rejected"] as const) : (["approved"] as const);
  return (
    <>
      <PageHeader
        title={`Reading of the ${r.maker} ${r.model}`}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            <StatusBadge status={r.status} />
            <span>
              Taken {r.takenAtText} · submitted by {r.submitterName ?? "a former user"}
              {r.teamName ? ` (${r.teamName})` : ""}
            </span>
          </span>
        }
        actions={
          <Link to={isCurator ? "/review" : "/readings"} className="rounded-md border border-rule px-3 py-2 text-sm hover:bg-paper-deep">
            {isCurator ? "Back to the review queue" : "All our readings"}
          </Link>
        }
      />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6">
          <Panel title="Result">
            <ReadingResult
              stcPmaxW={r.stcPmaxW}
              uncertaintyPct={r.uncertaintyPct}
              nameplatePmaxW={r.nameplatePmaxW}
              measuredPmaxW={r.measuredPmaxW}
              irradianceWm2={r.irradianceWm2}
              irradianceSource={r.irradianceSource}
              cellTempC={r.cellTempC}
              cellTempSource={r.moduleTempC === null ? "air-noct" : "back-sheet"}
              weight={r.weight}
              uncertaintyTerms={r.working?.uncertaintyTerms}
              sunElevationDeg={r.working?.sunElevationDeg}
              incidenceDeg={r.working?.incidenceDeg}
            />
            <p className="mt-4 border-t border-rule pt-3 text-sm text-ink-soft">
              Against this model's other approved readings:{" "}
              {outlier.z === null ? (
                `no outlier score yet (${outlier.approvedCount} approved; 3 are needed).`
              ) : (
                <span className="figures">
                  robust z = {outlier.z >= 0 ? "+" : ""}
                  {outlier.z.toFixed(1)} {Math.abs(outlier.z) > OUTLIER_Z ? "— ⚑ an outlier" : "— within the usual spread"} ({outlier.approvedCount} approved).
                </span>
              )}{" "}
              The catalogue shows the module at{" "}
              <span className="figures" data-testid="module-verified">
                {r.verifiedPmaxW === null
                  ? "nameplate only (no approved readings yet)"
                  : `${r.verifiedPmaxW.toFixed(1)} W verified from ${r.verifiedReadingCount} reading${r.verifiedReadingCount === 1 ? "" : "s"}`}
              </span>
              .
            </p>
          </Panel>
          {r.kind === "sweep" && r.sweep ? (
            <Panel title="Load sweep (as measured)">
              <SweepChart points={r.sweep} mpp={r.vmpV !== null && r.impA !== null ? { vmpV: r.vmpV, impA: r.impA, pmaxW: r.measuredPmaxW } : null} />
            </Panel>
          ) : null}
          <Panel title="Flags">
            <FlagList flags={r.flags} />
          </Panel>
          <Panel title="Conditions and method">
            <ReadingConditions reading={r} />
          </Panel>
        </div>
        <div className="space-y-6">
          <Panel title="Evidence photo">
            {r.photoId ? (
              <a href={`/files/${r.photoId}`} target="_blank" rel="noreferrer">
                <img
                  src={`/files/${r.photoId}`}
                  alt={`Evidence photo for the reading of the ${r.maker} ${r.model}`}
                  className="w-full rounded-md border border-rule"
                />
              </a>
            ) : (
              <p className="text-sm text-ink-faint">No photo with this reading.</p>
            )}
          </Panel>
          <Panel title="Decisions">
            <DecisionTimeline decisions={decisions} submittedAt={r.createdAt} submitterName={r.submitterName} />
          </Panel>
          {isCurator ? (
            <Panel title={r.status === "pending" ? "Decide" : "Change the decision"}>
              <DecisionForm readingId={r.id} action={`/readings/${r.id}`} allowed={[...allowed]} />
            </Panel>
          ) : null}
        </div>
      </div>
    </>
  );
}
