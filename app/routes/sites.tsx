import { Link } from "react-router";
import type { Route } from "./+types/sites";
import { PageHeader, Panel } from "~/components/page-header";
import { skyAssumptionOfPreset, skyAssumptionShort } from "~/domain/solar/sky-assumption";
import { requireTeamMember } from "~/server/guards.server";
import { listSites } from "~/server/sites.server";

export const meta: Route.MetaFunction = () => [{ title: "Sites · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  return { sites: await listSites(team.teamId), teamName: team.teamName };
}

function skyOf(s: { irradiance_source: string; clearness_preset: string | null }) {
  return s.irradiance_source === "clearness-preset" ? skyAssumptionOfPreset(s.clearness_preset) : null;
}

export default function Sites({ loaderData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader
        title="Sites"
        lead={`Your customers' places and their monthly climate. Only ${loaderData.teamName} sees them.`}
        actions={
          <Link to="/sites/new" className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark">
            New site
          </Link>
        }
      />
      <Panel>
        {loaderData.sites.length === 0 ? <p className="text-ink-soft">No sites yet. Start with the customer's place and its climate.</p> : null}
        <ul className="divide-y divide-rule">
          {loaderData.sites.map((s) => (
            <li key={s.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
              <span>
                <Link to={`/sites/${s.id}`} className="font-medium underline">
                  {s.name}
                </Link>{" "}
                <span className="text-sm text-ink-soft">for {s.customer_name}</span>
              </span>
              <span className="figures text-sm text-ink-faint">
                {s.latitude_deg.toFixed(2)}°, {s.longitude_deg.toFixed(2)}° · tilt {s.tilt_deg}° facing {s.azimuth_deg}° ·{" "}
                {skyOf(s) ? <span className="text-warn">⚠ {skyAssumptionShort(skyOf(s)!)}</span> : "measured irradiation"}
              </span>
            </li>
          ))}
        </ul>
      </Panel>
    </>
  );
}
