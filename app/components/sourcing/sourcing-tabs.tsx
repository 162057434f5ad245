// The sourcing section's own tabs.
import { Link, useLocation } from "react-router";

const TABS = [
  {
    to: "/sourcing",
    label: "Suppliers and offers",
    match: (p: string) => p === "/sourcing" || p.startsWith("/sourcing/suppliers") || p.startsWith("/sourcing/offers"),
  },
  { to: "/sourcing/compare/modules", label: "Compare", match: (p: string) => p.startsWith("/sourcing/compare") },
  { to: "/sourcing/import", label: "Import CSV", match: (p: string) => p === "/sourcing/import" },
  { to: "/sourcing/rates", label: "Currency and rates", match: (p: string) => p === "/sourcing/rates" },
];

export function SourcingTabs() {
  const { pathname } = useLocation();
  return (
    <nav aria-label="Sourcing" className="no-print mb-4 flex flex-wrap gap-1 border-b border-rule">
      {TABS.map((t) => {
        const active = t.match(pathname);
        return (
          <Link
            key={t.to}
            to={t.to}
            aria-current={active ? "page" : undefined}
            className={`-mb-px border-b-2 px-3 py-2 text-sm font-medium ${active ? "border-copper text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
          >
            {t.label}
          </Link>
        );
      })}
    </nav>
  );
}
