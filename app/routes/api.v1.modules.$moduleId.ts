// GET /api/v1/modules/:moduleId — one module's nameplate, derived and verified figures, and its
// approved readings at STC (values and dates only: who took them, for which team and where stay
// private). A merged duplicate answers with mergedInto, the model its readings moved to.
import type { Route } from "./+types/api.v1.modules.$moduleId";
import { findModuleDetail } from "~/server/catalogue/module-detail.server";
import { db } from "~/server/db.server";
import { requireApiActor } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireApiActor(request);
  const detail = await findModuleDetail(db, params.moduleId);
  if (!detail) return jsonError(404, "No module with that id in the catalogue.");
  return Response.json({ ...detail.module, mergedInto: detail.mergedInto, readings: detail.readings });
}
