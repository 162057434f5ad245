// POST /api/v1/plans/preview — works out a plan from choices without saving it (the plan editor's
// live re-plan). Team-scoped like every plan route.
import type { Route } from "./+types/api.v1.plans-preview";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError, readJsonBody } from "~/server/json-body.server";
import { planFromChoices } from "~/server/plans/plan-service.server";

export function loader() {
  return jsonError(405, "Use POST with the plan's choices as JSON.");
}

export async function action({ request }: Route.ActionArgs) {
  const { teamId } = await requireApiTeam(request);
  const outcome = await planFromChoices(teamId, await readJsonBody(request));
  if (!outcome.ok) return jsonError(400, outcome.message, outcome.fields);
  return Response.json({ plan: outcome.plan, sources: outcome.sources, parts: outcome.input.parts });
}
