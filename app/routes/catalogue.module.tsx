// A module's page: nameplate and verified figures side by side, each saying where it comes from,
// and a chart of every approved reading at STC against the nameplate. Readings show values and
// dates only: who took them, for which team and where is private to that team.
import type { ReactNode } from "react";
import { Link } from "react-router";
import type { Route } from "./+types/catalogue.module";
import { formatNumber, Num, Origin, RatioBadge } from "~/components/catalogue/figures";
import { NameplateTable } from "~/components/catalogue/nameplate-table";
import { ReadingsChart } from "~/components/catalogue/readings-chart";
import { ReadingsList } from "~/components/catalogue/readings-list";
import { PageHeader, Panel } from "~/components/page-header";
import { verifiedFigures } from "~/domain/catalogue/derived-figures";
import { findModuleDetail } from "~/server/catalogue/module-detail.server";
import { db } from "~/server/db.server";
import { requireStaff } from "~/server/guards.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: data ? `${data.module.maker} ${data.module.model} · Catalogue · Kitwright` : "Module · Kitwright" },
];

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireStaff(request);
  const detail = await findModuleDetail(db, params.moduleId);
  if (!detail) throw new Response("No module with that id in the catalogue.", { status: 404 });
  return { ...detail, canEdit: user.role === "curator" };
}

function FigureCard({ label, children, origin }: { label: string; children: ReactNode; origin: ReactNode }) {
  return (
    <div className="rounded-lg border border-rule bg-sheet p-4">
      <p className="text-sm font-medium text-ink-soft">{label}</p>
      <p className="mt-1 text-figure font-semibold">{children}</p>
      <p className="mt-1 text-xs text-ink-faint">{origin}</p>
    </div>
  );
}

export default function CatalogueModule({ loaderData }: Route.ComponentProps) {
  const { module: m, mergedInto, readings, canEdit } = loaderData;
  const measured = verifiedFigures(m, { verifiedPmaxW: readings.verifiedPmaxW, readingCount: readings.approvedCount, spreadPct: readings.spreadPct });
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to="/catalogue?kind=modules" className="text-ink-soft underline">
          ← Catalogue
        </Link>
      </p>
      <PageHeader
        title={`${m.maker} ${m.model}`}
        lead={`${m.cellTechnology} module · ${m.cellsInSeries} cells in series · ${formatNumber(m.lengthMm)} × ${formatNumber(m.widthMm)} mm`}
        actions={
          canEdit && !mergedInto ? (
            <div className="flex gap-2 text-sm">
              <Link to={`/catalogue/modules/${m.id}/edit`} className="rounded-md bg-copper px-3 py-2 font-medium text-sheet hover:bg-copper-dark">
                Edit nameplate
              </Link>
              <Link to={`/catalogue/modules/${m.id}/merge`} className="rounded-md border border-rule px-3 py-2 hover:bg-paper-deep">
                Merge duplicate…
              </Link>
            </div>
          ) : null
        }
      />
      {mergedInto ? (
        <div role="status" className="mb-6 rounded-lg border border-warn bg-warn-wash p-4 text-sm">
          <p className="font-medium text-warn">
            <span aria-hidden="true">⇢</span> This model was merged into{" "}
            <Link to={`/catalogue/modules/${mergedInto.id}`} className="underline">
              {mergedInto.maker} {mergedInto.model}
            </Link>
            .
          </p>
          <p className="mt-1 text-ink-soft">
            It was a duplicate entry; its field readings now count for that model, and it no longer appears in the catalogue's lists.
          </p>
        </div>
      ) : null}
      <div className="mb-6 grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <FigureCard label="Nameplate Pmax" origin="nameplate · maker's datasheet at STC">
          <Num value={m.pmaxW} unit="W" />
        </FigureCard>
        <FigureCard
          label="Verified Pmax"
          origin={
            readings.approvedCount ? (
              <>
                weighted median, <Origin readingCount={readings.approvedCount} />
                {readings.spreadPct !== null ? ` · spread ±${formatNumber(readings.spreadPct, 1)} %` : ""}
              </>
            ) : (
              "no readings yet"
            )
          }
        >
          <Num value={readings.verifiedPmaxW} unit="W" decimals={1} />
        </FigureCard>
        <FigureCard label="Verified ÷ nameplate" origin={readings.approvedCount ? "verified median ÷ nameplate" : "needs approved readings"}>
          <span data-testid="verified-ratio">
            <RatioBadge ratio={readings.verifiedRatio} />
          </span>
        </FigureCard>
        <FigureCard label="Power density" origin={`nameplate${measured.measuredDensityWm2 !== null ? " · measured" : ""} over ${formatNumber(m.areaM2, 3)} m²`}>
          <Num value={m.nameplateDensityWm2} unit="W/m²" />
          {measured.measuredDensityWm2 !== null ? (
            <span className="block text-base font-normal text-ink-soft">
              measured <Num value={measured.measuredDensityWm2} unit="W/m²" />
            </span>
          ) : null}
        </FigureCard>
      </div>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="space-y-6">
          <Panel title="Field readings at STC">
            {readings.points.length ? (
              <>
                <ReadingsChart points={readings.points} nameplateW={m.pmaxW} verifiedW={readings.verifiedPmaxW} />
                <p className="mt-2 text-xs text-ink-faint">
                  {readings.approvedCount} approved reading{readings.approvedCount === 1 ? "" : "s"}
                  {readings.approvedCount > readings.points.length ? ` (the latest ${readings.points.length} drawn)` : ""}, each normalised to 1000 W/m² and 25
                  °C cell temperature. Solid dots: irradiance measured; hollow: estimated from a clear-sky model. Range {formatNumber(readings.minStcPmaxW, 1)}–
                  {formatNumber(readings.maxStcPmaxW, 1)} W.
                </p>
              </>
            ) : (
              <p className="text-ink-soft" data-testid="no-readings">
                No approved readings yet: the figures above are the nameplate only. Installers can submit a field reading; a curator reviews it before it
                counts.
              </p>
            )}
          </Panel>
          {readings.points.length ? <ReadingsList points={readings.points} nameplateW={m.pmaxW} /> : null}
        </div>
        <Panel title="Nameplate (datasheet, STC)">
          <NameplateTable module={m} measuredEfficiencyPct={measured.measuredEfficiencyPct} />
        </Panel>
      </div>
    </>
  );
}
