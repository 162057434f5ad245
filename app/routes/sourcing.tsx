// Sourcing overview: the team's suppliers and every offer, expired ones flagged (they are kept but
// left out of the comparisons), with the way to compare, import, export and set rates.
import { Link } from "react-router";
import type { Route } from "./+types/sourcing";
import { PageHeader, Panel } from "~/components/page-header";
import { OfferList } from "~/components/sourcing/offer-list";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { isOfferPartKind, OFFER_PART_KINDS } from "~/domain/sourcing/offer-facts";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { db } from "~/server/db.server";
import { requireTeamMember } from "~/server/guards.server";
import { offerJson } from "~/server/sourcing/offer-json.server";
import { listOffers } from "~/server/sourcing/offers.server";
import { getQuotingCurrency } from "~/server/sourcing/settings.server";
import { listSuppliers } from "~/server/sourcing/suppliers.server";

export const meta: Route.MetaFunction = () => [{ title: "Sourcing · Kitwright" }];

const KIND_TITLES = { modules: "Modules", batteries: "Batteries", controllers: "Charge controllers", inverters: "Inverters" } as const;

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const kindParam = new URL(request.url).searchParams.get("kind");
  const kind = isOfferPartKind(kindParam) ? kindParam : null;
  const asOf = todayIso();
  const [suppliers, offers, quoting] = await Promise.all([
    listSuppliers(db, team.teamId, asOf),
    listOffers(db, team.teamId, { partKind: kind ?? undefined, asOf }),
    getQuotingCurrency(db, team.teamId),
  ]);
  return {
    teamName: team.teamName,
    kind,
    asOf,
    quoting,
    suppliers: suppliers.map((s) => ({
      id: s.id,
      name: s.name,
      currency: s.currency,
      contact: s.contact,
      offerCount: Number(s.offerCount),
      expiredCount: Number(s.expiredCount),
    })),
    offers: offers.map(offerJson),
  };
}

export default function Sourcing({ loaderData }: Route.ComponentProps) {
  const { suppliers, offers, kind, quoting } = loaderData;
  const expired = offers.filter((o) => o.expired).length;
  return (
    <>
      <PageHeader
        title="Sourcing"
        lead={`Your suppliers and the prices they offer you. Only ${loaderData.teamName} sees them. Comparisons are in ${quoting.currency}${quoting.chosen ? "" : " (the default until you choose)"}.`}
        actions={
          <div className="flex flex-wrap gap-2">
            <Link to="/sourcing/offers/new" className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
              New offer
            </Link>
            <Link to="/sourcing/suppliers/new" className="rounded-md border border-copper px-4 py-2 font-medium text-copper">
              New supplier
            </Link>
            <a href="/sourcing/export" className="rounded-md border border-rule px-4 py-2 font-medium text-ink-soft" download>
              Export CSV
            </a>
          </div>
        }
      />
      <SourcingTabs />
      <div className="space-y-6">
        <Panel title="Suppliers">
          {suppliers.length === 0 ? <p className="text-ink-soft">No suppliers yet. Add one, or import a price list.</p> : null}
          <ul className="grid gap-x-6 gap-y-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="supplier-list">
            {suppliers.map((s) => (
              <li key={s.id} className="border-l-2 border-rule py-1 pl-3">
                <Link to={`/sourcing/suppliers/${s.id}`} className="font-medium underline decoration-rule hover:decoration-copper">
                  {s.name}
                </Link>{" "}
                <span className="text-xs text-ink-faint">{s.currency}</span>
                <span className="block text-xs text-ink-soft">
                  {s.offerCount} offer{s.offerCount === 1 ? "" : "s"}
                  {s.expiredCount ? (
                    <span className="text-warn">
                      {" "}
                      · <span aria-hidden="true">⚠</span> {s.expiredCount} expired
                    </span>
                  ) : null}
                </span>
              </li>
            ))}
          </ul>
        </Panel>
        <Panel title="Offers">
          <nav aria-label="Kind of part" className="mb-3 flex flex-wrap items-center gap-1 text-sm">
            <Link
              to="/sourcing"
              aria-current={kind === null ? "page" : undefined}
              className={`rounded px-2 py-1 ${kind === null ? "bg-copper-wash font-medium" : "text-ink-soft"}`}
            >
              All
            </Link>
            {OFFER_PART_KINDS.map((k) => (
              <Link
                key={k}
                to={`/sourcing?kind=${k}`}
                aria-current={kind === k ? "page" : undefined}
                className={`rounded px-2 py-1 ${kind === k ? "bg-copper-wash font-medium" : "text-ink-soft"}`}
              >
                {KIND_TITLES[k]}
              </Link>
            ))}
            {kind ? (
              <Link to={`/sourcing/compare/${kind}`} className="ml-auto text-copper underline">
                Compare {KIND_TITLES[kind].toLowerCase()} →
              </Link>
            ) : null}
          </nav>
          {expired ? (
            <p className="mb-3 flex gap-1.5 rounded-md bg-warn-wash px-3 py-2 text-sm text-warn" role="note">
              <span aria-hidden="true">⚠</span>
              {expired} offer{expired === 1 ? " has" : "s have"} expired (valid-until day before {loaderData.asOf}). They stay here for your records and are
              left out of the comparisons.
            </p>
          ) : null}
          <OfferList offers={offers} />
        </Panel>
      </div>
    </>
  );
}
