// GET /api/v1/sites/:siteId — one of the team's sites (another team's id answers 404).
import type { Route } from "./+types/api.v1.site";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { findSite, siteToForm } from "~/server/sites.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const site = await findSite(teamId, params.siteId);
  if (!site) return jsonError(404, "No such site in your team.");
  return Response.json({ id: site.id, ...siteToForm(site), createdAt: site.created_at, updatedAt: site.updated_at });
}
