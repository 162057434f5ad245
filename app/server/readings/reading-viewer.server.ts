// Who is looking at field readings, and what they may see: curators and admins see every reading;
// an installer sees the readings their own team submitted; nobody else sees any.
import { findMembership, forbidden, requireUser } from "../guards.server";
import type { Role } from "~/lib/roles";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(value: string) {
  return UUID.test(value);
}

export interface ReadingViewer {
  userId: string;
  role: Role;
  teamId: string | null;
  seesAll: boolean;
  isCurator: boolean;
}

export async function requireReadingViewer(request: Request): Promise<ReadingViewer> {
  const user = await requireUser(request);
  const seesAll = user.role === "curator" || user.role === "admin";
  const team = user.role === "installer" ? await findMembership(user.id) : null;
  if (!seesAll && !team) throw forbidden("Field readings are open to installer teams and curators.");
  return { userId: user.id, role: user.role, teamId: team?.teamId ?? null, seesAll, isCurator: user.role === "curator" };
}
