// /readings — the field readings my team has submitted, with their status.
import { Link } from "react-router";
import type { Route } from "./+types/readings";
import { PageHeader, Panel } from "~/components/page-header";
import { ReadingsTable } from "~/components/readings/readings-table";
import { requireTeamMember } from "~/server/guards.server";
import { listReadings, READING_STATUSES, type ReadingStatus } from "~/server/readings/reading-queries.server";

export const meta: Route.MetaFunction = () => [{ title: "Field readings · Kitwright" }];

const PAGE_SIZE = 50;

export async function loader({ request }: Route.LoaderArgs) {
  const { user, team } = await requireTeamMember(request);
  const url = new URL(request.url);
  const statusParam = url.searchParams.get("status");
  const status = READING_STATUSES.includes(statusParam as ReadingStatus) ? (statusParam as ReadingStatus) : null;
  const page = Math.max(1, Math.min(10_000, Number.parseInt(url.searchParams.get("page") ?? "1", 10) || 1));
  const viewer = { userId: user.id, role: user.role, teamId: team.teamId, seesAll: false, isCurator: false };
  const { items, total } = await listReadings(viewer, { status, limit: PAGE_SIZE, offset: (page - 1) * PAGE_SIZE });
  return {
    teamName: team.teamName,
    status,
    page,
    pages: Math.max(1, Math.ceil(total / PAGE_SIZE)),
    total,
    rows: items.map((r) => ({
      id: r.id,
      status: r.status,
      kind: r.kind,
      maker: r.maker,
      model: r.model,
      nameplatePmaxW: r.nameplatePmaxW,
      stcPmaxW: r.stcPmaxW,
      uncertaintyPct: r.uncertaintyPct,
      irradianceSource: r.irradianceSource,
      flagCount: r.flags.length,
      takenAt: new Date(r.takenAt).toISOString(),
      utcOffsetMin: r.utcOffsetMin,
      submitterName: r.submitterName,
    })),
  };
}

const FILTERS: { label: string; status: ReadingStatus | null }[] = [
  { label: "All", status: null },
  { label: "Pending review", status: "pending" },
  { label: "Approved", status: "approved" },
  { label: "Rejected", status: "rejected" },
];

export default function Readings({ loaderData }: Route.ComponentProps) {
  const { rows, status, page, pages, total, teamName } = loaderData;
  const query = (next: { status?: ReadingStatus | null; page?: number }) => {
    const params = new URLSearchParams();
    const s = next.status === undefined ? status : next.status;
    if (s) params.set("status", s);
    if (next.page && next.page > 1) params.set("page", String(next.page));
    const text = params.toString();
    return text ? `?${text}` : "/readings";
  };
  return (
    <>
      <PageHeader
        title="Field readings"
        lead={`Measurements of module power submitted by ${teamName}. A curator reviews each one; approved readings set the catalogue's verified power.`}
        actions={
          <Link to="/readings/new" className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
            Submit a reading
          </Link>
        }
      />
      <nav aria-label="Filter by status" className="mb-4 flex flex-wrap gap-2 text-sm">
        {FILTERS.map((f) => (
          <Link
            key={f.label}
            to={query({ status: f.status, page: 1 })}
            aria-current={f.status === status ? "page" : undefined}
            className={`rounded-md border px-3 py-1 ${f.status === status ? "border-ink bg-ink text-paper" : "border-rule hover:bg-paper-deep"}`}
          >
            {f.label}
          </Link>
        ))}
      </nav>
      <Panel>
        {rows.length === 0 ? (
          <p className="text-ink-soft">{status ? "No readings with this status." : "Your team has not submitted a reading yet."}</p>
        ) : (
          <ReadingsTable rows={rows} />
        )}
        {pages > 1 ? (
          <p className="mt-4 flex items-center gap-3 text-sm">
            {page > 1 ? <Link to={query({ page: page - 1 })}>← Newer</Link> : null}
            <span className="figures text-ink-soft">
              Page {page} of {pages} ({total} readings)
            </span>
            {page < pages ? <Link to={query({ page: page + 1 })}>Older →</Link> : null}
          </p>
        ) : null}
      </Panel>
    </>
  );
}
