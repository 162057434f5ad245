// POST /api/v1/plans/:planId/alternatives — the cheapest kits from the team's valid offers that meet
// every check of the plan, with what the search considered and pruned. Another team's plan is a 404.
import type { Route } from "./+types/api.v1.plans.$planId.alternatives";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { findAlternatives } from "~/server/sourcing/alternatives.server";
import { alternativesJson } from "~/lib/alternatives-view";

export async function loader() {
  return jsonError(405, "Use POST to search for kit alternatives.");
}

export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "Use POST to search for kit alternatives.");
  const { teamId } = await requireApiTeam(request);
  const found = await findAlternatives(teamId, params.planId);
  if (!found) return jsonError(404, "No such plan in your team.");
  if (!found.result) return jsonError(409, found.problem ?? "This plan cannot be searched.");
  return Response.json(alternativesJson(found));
}
