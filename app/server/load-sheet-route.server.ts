// Shared pieces of the two load sheet routes: the guarded site, and the inverters offered for totals.
import { requireTeamMember } from "./guards.server";
import { findSite } from "./sites.server";
import { listInvertersForTotals } from "./load-sheets.server";

export async function requireTeamSite(request: Request, siteId: string) {
  const { user, team } = await requireTeamMember(request);
  const site = await findSite(team.teamId, siteId);
  if (!site) throw new Response("No such site in your team.", { status: 404 });
  return { user, team, site };
}

export async function inverterChoices() {
  const rows = await listInvertersForTotals();
  return rows.map((i) => ({
    id: i.id,
    label: `${i.maker} ${i.model} — ${i.continuous_w} W, ${i.dc_input_voltage_v} V, ${i.efficiency_pct} %, ${i.idle_draw_w} W idle`,
    params: { efficiencyPct: i.efficiency_pct, idleDrawW: i.idle_draw_w },
  }));
}
