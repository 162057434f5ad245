// Who is calling: useful for integrators checking their API key.
import type { Route } from "./+types/api.v1.me";
import { requireApiActor } from "~/server/guards.server";

export async function loader({ request }: Route.LoaderArgs) {
  const actor = await requireApiActor(request, { allowCustomers: true });
  if (actor.kind === "api-key") return Response.json({ kind: "api-key", teamId: actor.teamId });
  return Response.json({
    kind: "user",
    user: { id: actor.user.id, name: actor.user.name, email: actor.user.email, role: actor.user.role },
    teamId: actor.teamId,
  });
}
