// POST /api/v1/yield — monthly energy per module at a site (see app/domain/solar/yield-request.ts).
import type { Route } from "./+types/api.v1.yield";
import { requireApiActor } from "~/server/guards.server";
import { jsonError, readJsonBody } from "~/server/json-body.server";
import { computeYield } from "~/server/yield.server";

export function loader() {
  return jsonError(405, "Use POST with a JSON body.");
}

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "Use POST with a JSON body.");
  await requireApiActor(request);
  const outcome = await computeYield(await readJsonBody(request));
  if (!outcome.ok) return Response.json({ error: outcome.error }, { status: outcome.status });
  return Response.json(outcome.result);
}
