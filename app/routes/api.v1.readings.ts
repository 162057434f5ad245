// GET /api/v1/readings?status=&limit=&offset= — field readings: an installer team's own (session or
// team API key), or every reading for curators and admins. Customers get 403.
import type { Route } from "./+types/api.v1.readings";
import { jsonError } from "~/server/json-body.server";
import { findMembership, requireApiActor } from "~/server/guards.server";
import { listReadings, READING_STATUSES, type ReadingStatus } from "~/server/readings/reading-queries.server";
import type { ReadingViewer } from "~/server/readings/reading-viewer.server";

function intParam(url: URL, name: string, fallback: number, min: number, max: number) {
  const raw = url.searchParams.get(name);
  if (raw === null) return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min || value > max)
    throw jsonError(400, `${name} must be a whole number from ${min} to ${max}.`, { [name]: "out of range" });
  return value;
}

export async function loader({ request }: Route.LoaderArgs) {
  const actor = await requireApiActor(request);
  let viewer: ReadingViewer;
  if (actor.kind === "api-key") {
    viewer = { userId: "", role: "installer", teamId: actor.teamId, seesAll: false, isCurator: false };
  } else {
    const seesAll = actor.user.role === "curator" || actor.user.role === "admin";
    const teamId = actor.user.role === "installer" ? ((await findMembership(actor.user.id))?.teamId ?? null) : null;
    if (!seesAll && !teamId) throw jsonError(403, "Field readings are open to installer teams and curators.");
    viewer = { userId: actor.user.id, role: actor.user.role, teamId, seesAll, isCurator: actor.user.role === "curator" };
  }
  const url = new URL(request.url);
  const statusParam = url.searchParams.get("status");
  if (statusParam !== null && !READING_STATUSES.includes(statusParam as ReadingStatus)) {
    throw jsonError(400, `status must be one of ${READING_STATUSES.join(", ")}.`, { status: "unknown status" });
  }
  const limit = intParam(url, "limit", 50, 1, 200);
  const offset = intParam(url, "offset", 0, 0, 1_000_000);
  const { items, total } = await listReadings(viewer, { status: (statusParam as ReadingStatus | null) ?? null, limit, offset });
  return Response.json({
    total,
    items: items.map((r) => ({
      id: r.id,
      status: r.status,
      kind: r.kind,
      module: { id: r.moduleId, maker: r.maker, model: r.model, nameplatePmaxW: r.nameplatePmaxW },
      measuredPmaxW: r.measuredPmaxW,
      stcPmaxW: r.stcPmaxW,
      uncertaintyPct: r.uncertaintyPct,
      weight: r.weight,
      irradianceSource: r.irradianceSource,
      flags: r.flags,
      takenAt: new Date(r.takenAt).toISOString(),
      submittedAt: new Date(r.createdAt).toISOString(),
      submittedBy: r.submitterName,
      team: r.teamName,
    })),
  });
}
