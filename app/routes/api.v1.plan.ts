// GET /api/v1/plans/:planId — a plan's latest revision (or ?revision=N) with its snapshot and history.
import type { Route } from "./+types/api.v1.plan";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { findPlan } from "~/server/plans/plans.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const revisionParam = new URL(request.url).searchParams.get("revision");
  const revision = revisionParam === null ? undefined : Number(revisionParam);
  if (revision !== undefined && !(Number.isInteger(revision) && revision >= 1))
    return jsonError(400, "revision must be a whole number from 1.", { revision: "not a revision number" });
  const found = await findPlan(teamId, params.planId, revision);
  if (!found) return jsonError(404, "No such plan (or revision) in your team.");
  const { plan, revision: rev, history } = found;
  return Response.json({
    id: plan.id,
    name: plan.name,
    siteId: plan.site_id,
    loadSheetId: plan.load_sheet_id,
    revision: rev.revision,
    latestRevision: plan.latest_revision,
    choices: rev.choices,
    inputs: rev.inputs,
    result: rev.result,
    overrides: rev.overrides,
    history,
  });
}
