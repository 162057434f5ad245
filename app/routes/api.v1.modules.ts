// GET /api/v1/modules — the shared catalogue's modules: search (q), filters (technology, minW, maxW,
// hasReadings, ratioBelow), sort (sort, dir) and paging (limit, offset). Answers { items, total };
// a bad parameter is a 400 naming it. Merged duplicates are left out.
import type { Route } from "./+types/api.v1.modules";
import { listModulePage } from "~/server/catalogue/module-list.server";
import { db } from "~/server/db.server";
import { requireApiActor } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { parsePartQuery } from "~/lib/catalogue-query";

export async function loader({ request }: Route.LoaderArgs) {
  await requireApiActor(request);
  const parsed = parsePartQuery("modules", new URL(request.url).searchParams);
  if (!parsed.ok) {
    const count = Object.keys(parsed.fields).length;
    return jsonError(400, `${count} query parameter${count === 1 ? " needs" : "s need"} attention.`, parsed.fields);
  }
  return Response.json(await listModulePage(db, parsed.query));
}
