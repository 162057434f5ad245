import { Link } from "react-router";

export function SiteLoadSheets({ siteId, sheets }: { siteId: string; sheets: { id: string; name: string; applianceCount: number }[] }) {
  return (
    <section className="mb-6 rounded-xl border border-rule bg-sheet p-5 shadow-sm">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-semibold">Load sheets</h2>
        <Link to={`/sites/${siteId}/loads/new`} className="rounded-md bg-copper px-3 py-1.5 text-sm font-medium text-sheet hover:bg-copper-dark">
          New load sheet
        </Link>
      </div>
      {sheets.length === 0 ? <p className="mt-2 text-sm text-ink-soft">No load sheet yet: list what the customer will run, and when.</p> : null}
      <ul className="mt-2 divide-y divide-rule">
        {sheets.map((s) => (
          <li key={s.id} className="py-2">
            <Link to={`/sites/${siteId}/loads/${s.id}`} className="font-medium underline">
              {s.name}
            </Link>{" "}
            <span className="text-sm text-ink-faint">
              {s.applianceCount} appliance{s.applianceCount === 1 ? "" : "s"}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
