// The shared catalogue: modules, batteries, charge controllers and inverters in one searchable,
// filterable table. Search, filters, sort and page live in the URL; the server does the work.
import { useMemo } from "react";
import { Link, useLocation, useNavigate, useNavigation } from "react-router";
import type { Route } from "./+types/catalogue";
import { CatalogueFilters } from "~/components/catalogue/catalogue-filters";
import { DataTable, type CatalogueColumns, type SortChoice } from "~/components/catalogue/data-table";
import { formatNumber } from "~/components/catalogue/figures";
import { MODULE_NUMERIC_COLUMNS, moduleColumns } from "~/components/catalogue/module-columns";
import { BATTERY_NUMERIC, batteryColumns, CONTROLLER_NUMERIC, controllerColumns, INVERTER_NUMERIC, inverterColumns } from "~/components/catalogue/part-columns";
import { PageHeader, Panel } from "~/components/page-header";
import { isPartKind, PART_KIND_LABELS, PART_KINDS, type PartKind } from "~/domain/catalogue/part-kinds";
import { parsePartQuery, type PartListQuery } from "~/lib/catalogue-query";
import { listPartPage } from "~/server/catalogue/part-list.server";
import { db } from "~/server/db.server";
import { requireStaff } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "Catalogue · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireStaff(request);
  const params = new URL(request.url).searchParams;
  const kindParam = params.get("kind") ?? "modules";
  const kind: PartKind = isPartKind(kindParam) ? kindParam : "modules";
  const parsed = parsePartQuery(kind, params);
  const query = parsed.ok ? parsed.query : parsed.fallback;
  const page = await listPartPage(db, query);
  return { kind, query: query as PartListQuery, page, ignored: parsed.ok ? null : parsed.fields, canEdit: user.role === "curator" };
}

function columnsFor(kind: PartKind, canEdit: boolean) {
  switch (kind) {
    case "modules":
      return { columns: moduleColumns(canEdit), numeric: MODULE_NUMERIC_COLUMNS };
    case "batteries":
      return { columns: batteryColumns(canEdit), numeric: BATTERY_NUMERIC };
    case "controllers":
      return { columns: controllerColumns(canEdit), numeric: CONTROLLER_NUMERIC };
    case "inverters":
      return { columns: inverterColumns(canEdit), numeric: INVERTER_NUMERIC };
  }
}

function withParams(search: string, kind: PartKind, changes: Record<string, string | number | undefined>) {
  const params = new URLSearchParams(search);
  params.set("kind", kind);
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined || value === "") params.delete(key);
    else params.set(key, String(value));
  }
  return `/catalogue?${params}`;
}

export default function Catalogue({ loaderData }: Route.ComponentProps) {
  const { kind, query, page, ignored, canEdit } = loaderData;
  const navigate = useNavigate();
  const navigation = useNavigation();
  const { search } = useLocation();
  const pending = navigation.state === "loading" && navigation.location?.pathname === "/catalogue";
  const { columns, numeric } = useMemo(() => columnsFor(kind, canEdit), [kind, canEdit]);
  const label = PART_KIND_LABELS[kind];
  const first = page.total === 0 ? 0 : query.offset + 1;
  const last = Math.min(query.offset + query.limit, page.total);

  function onSort(choice: SortChoice) {
    navigate(withParams(search, kind, { sort: choice.sort, dir: choice.dir, offset: undefined }), { preventScrollReset: true });
  }

  return (
    <>
      <PageHeader
        title="Catalogue"
        lead="Shared by every installer team. Nameplate figures come from the makers' datasheets at STC; verified figures come from field readings, normalised to STC and approved by a curator."
        actions={
          canEdit ? (
            <div className="flex gap-2 text-sm">
              <Link to={`/catalogue/${kind}/new`} className="rounded-md bg-copper px-3 py-2 font-medium text-sheet hover:bg-copper-dark">
                New {label.singular}
              </Link>
              <Link to={`/catalogue/import?kind=${kind}`} className="rounded-md border border-rule px-3 py-2 hover:bg-paper-deep">
                Import CSV
              </Link>
            </div>
          ) : null
        }
      />
      <nav aria-label="Part kinds" className="mb-4 flex flex-wrap gap-1 border-b border-rule">
        {PART_KINDS.map((k) => (
          <Link
            key={k}
            to={`/catalogue?kind=${k}`}
            aria-current={k === kind ? "page" : undefined}
            className={`-mb-px border-b-2 px-3 py-2 text-sm font-medium ${k === kind ? "border-copper text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
          >
            {PART_KIND_LABELS[k].plural}
          </Link>
        ))}
      </nav>
      <Panel>
        <CatalogueFilters key={kind} kind={kind} query={query} />
        {ignored ? (
          <p role="status" className="mb-3 rounded-md border border-warn bg-warn-wash px-3 py-2 text-sm text-warn">
            <span aria-hidden="true">⚠</span> Some settings in the address were not understood and were left out: {Object.values(ignored).join(" ")}
          </p>
        ) : null}
        <p className="mb-2 flex flex-wrap items-baseline justify-between gap-2 text-sm text-ink-soft" aria-live="polite">
          <span data-testid="result-count">
            {formatNumber(page.total)} {page.total === 1 ? label.singular : label.plural.toLowerCase()}
            {page.total > 0 ? ` · showing ${formatNumber(first)}–${formatNumber(last)}` : ""}
          </span>
          {pending ? <span>⟳ Loading…</span> : null}
        </p>
        <DataTable
          columns={columns as CatalogueColumns<{ id: string }>}
          data={page.items as { id: string }[]}
          sort={{ sort: query.sort, dir: query.dir }}
          onSort={onSort}
          caption={`${label.plural} in the catalogue`}
          numericColumns={numeric}
          pending={pending}
        />
        <Pager query={query} total={page.total} search={search} />
      </Panel>
    </>
  );
}

function Pager({ query, total, search }: { query: PartListQuery; total: number; search: string }) {
  const pages = Math.max(1, Math.ceil(total / query.limit));
  const current = Math.floor(query.offset / query.limit) + 1;
  const linkClass = "rounded-md border border-rule px-3 py-1.5 hover:bg-paper-deep";
  return (
    <nav aria-label="Pages" className="mt-4 flex flex-wrap items-center gap-3 text-sm text-ink-soft">
      {current > 1 ? (
        <Link to={withParams(search, query.kind, { offset: Math.max(0, query.offset - query.limit) })} preventScrollReset className={linkClass}>
          ← Previous
        </Link>
      ) : null}
      <span>
        Page {formatNumber(current)} of {formatNumber(pages)}
      </span>
      {current < pages ? (
        <Link to={withParams(search, query.kind, { offset: query.offset + query.limit })} preventScrollReset className={linkClass}>
          Next →
        </Link>
      ) : null}
    </nav>
  );
}
