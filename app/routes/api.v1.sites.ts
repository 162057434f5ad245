// GET /api/v1/sites — the team's sites; POST — create one (JSON body: the site form's fields).
import type { Route } from "./+types/api.v1.sites";
import { zodIssuesToFields } from "~/domain/solar/yield-request";
import { siteFormSchema } from "~/lib/site-forms";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError, readJsonBody } from "~/server/json-body.server";
import { createSite, findSite, listSites, siteToForm } from "~/server/sites.server";

export async function loader({ request }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const sites = await listSites(teamId);
  return Response.json({ items: sites, total: sites.length });
}

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "Use GET to list or POST to create.");
  const { teamId, userId } = await requireApiTeam(request);
  const parsed = siteFormSchema.safeParse(await readJsonBody(request));
  if (!parsed.success) return jsonError(400, "The site needs corrections.", zodIssuesToFields(parsed.error));
  const id = await createSite(teamId, userId, parsed.data);
  const site = await findSite(teamId, id);
  return Response.json({ id, ...siteToForm(site!) }, { status: 201 });
}
