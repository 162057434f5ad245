// GET /api/v1/plans — the team's plans; POST — compute and save a plan (body: the plan's choices).
import type { Route } from "./+types/api.v1.plans";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError, readJsonBody } from "~/server/json-body.server";
import { planFromChoices } from "~/server/plans/plan-service.server";
import { createPlan, listPlans } from "~/server/plans/plans.server";

export async function loader({ request }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const plans = await listPlans(teamId);
  return Response.json({
    items: plans.map((p) => ({
      id: p.id,
      name: p.name,
      site: p.siteName,
      revision: p.latest_revision,
      failingSafetyChecks: p.failing_safety_checks,
      updatedAt: p.updated_at,
    })),
    total: plans.length,
  });
}

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "Use GET to list or POST to create.");
  const { teamId, userId } = await requireApiTeam(request);
  const outcome = await planFromChoices(teamId, await readJsonBody(request));
  if (!outcome.ok) return jsonError(400, outcome.message, outcome.fields);
  // A plan saved through an API key has no author; the key's team owns it.
  const id = await createPlan(teamId, userId, outcome.choices, outcome.input, outcome.plan);
  return Response.json({ id, revision: 1, plan: outcome.plan }, { status: 201 });
}
