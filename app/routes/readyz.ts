import { checkReadiness } from "~/server/readiness.server";

export async function loader() {
  const state = await checkReadiness();
  const body = { ready: state.ready, database: state.database, pendingMigrations: state.pendingMigrations };
  return Response.json(body, { status: state.ready ? 200 : 503, headers: { "Cache-Control": "no-store" } });
}
