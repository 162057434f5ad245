// GET /api/v1/modules — the shared catalogue's modules (search and paging).
import type { Route } from "./+types/api.v1.modules";
import { requireApiActor } from "~/server/guards.server";
import { listModules } from "~/server/modules.server";

function intParam(url: URL, name: string, fallback: number, min: number, max: number) {
  const raw = url.searchParams.get(name);
  if (raw === null) return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min || value > max) {
    throw Response.json({ error: { message: `${name} must be a whole number from ${min} to ${max}.`, fields: { [name]: "out of range" } } }, { status: 400 });
  }
  return value;
}

export async function loader({ request }: Route.LoaderArgs) {
  await requireApiActor(request);
  const url = new URL(request.url);
  const search = (url.searchParams.get("q") ?? "").trim().slice(0, 100);
  const limit = intParam(url, "limit", 50, 1, 200);
  const offset = intParam(url, "offset", 0, 0, 1_000_000);
  return Response.json(await listModules({ search, limit, offset }));
}
