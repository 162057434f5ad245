import { Link } from "react-router";
import type { Route } from "./+types/plans";
import { PageHeader, Panel } from "~/components/page-header";
import { requireTeamMember } from "~/server/guards.server";
import { listPlans } from "~/server/plans/plans.server";
import { skyAssumptionOfMonths, skyAssumptionSentence } from "~/domain/solar/sky-assumption";

export const meta: Route.MetaFunction = () => [{ title: "Kit plans · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const plans = await listPlans(team.teamId);
  return {
    plans: plans.map(({ assumedSkyMonths, ...p }) => {
      const sky = skyAssumptionOfMonths(assumedSkyMonths);
      return { ...p, sky: sky ? skyAssumptionSentence(sky) : null };
    }),
  };
}

export default function Plans({ loaderData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader
        title="Kit plans"
        lead="Each plan sizes a kit for one site and load sheet, for the worst month, and keeps every revision."
        actions={
          <Link to="/plans/new" className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
            New plan
          </Link>
        }
      />
      <Panel>
        {loaderData.plans.length === 0 ? <p className="text-ink-soft">No plans yet. A plan needs a site with a load sheet.</p> : null}
        <ul className="divide-y divide-rule">
          {loaderData.plans.map((p) => {
            const overridden = p.overrides.length;
            const open = p.failing_safety_checks - Math.min(overridden, p.failing_safety_checks);
            return (
              <li key={p.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <span>
                  <Link to={`/plans/${p.id}`} className="font-medium underline">
                    {p.name}
                  </Link>{" "}
                  <span className="text-sm text-ink-soft">
                    at {p.siteName} · revision {p.latest_revision}
                  </span>
                  {p.sky ? (
                    <span className="block text-sm text-warn" data-testid="plan-sky-assumption">
                      <span aria-hidden="true">⚠ </span>
                      {p.sky}
                    </span>
                  ) : null}
                </span>
                <span className={`text-sm ${open ? "text-fail" : "text-pass"}`}>
                  {open
                    ? `✕ ${open} safety check${open === 1 ? "" : "s"} failing`
                    : overridden
                      ? `⚠ ${overridden} failing safety check${overridden === 1 ? "" : "s"} accepted with a reason`
                      : "✓ safety checks pass"}
                </span>
              </li>
            );
          })}
        </ul>
      </Panel>
    </>
  );
}
