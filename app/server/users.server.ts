// The admin's view of accounts.
import { db } from "./db.server";
import type { Role } from "~/lib/roles";

export const USERS_PAGE_SIZE = 50;

export async function listUsers({ search, page }: { search: string; page: number }) {
  let query = db.selectFrom("user");
  if (search) {
    const pattern = `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query = query.where((eb) => eb.or([eb("user.name", "ilike", pattern), eb("user.email", "ilike", pattern)]));
  }
  const [rows, total] = await Promise.all([
    query
      .leftJoin("member", "member.userId", "user.id")
      .leftJoin("organization", "organization.id", "member.organizationId")
      .select(["user.id", "user.name", "user.email", "user.role", "user.createdAt", "organization.name as teamName", "member.role as membershipRole"])
      .orderBy("user.createdAt", "desc")
      .orderBy("user.id")
      .limit(USERS_PAGE_SIZE)
      .offset((page - 1) * USERS_PAGE_SIZE)
      .execute(),
    query.select((eb) => eb.fn.countAll<number>().as("count")).executeTakeFirstOrThrow(),
  ]);
  return { rows, total: Number(total.count) };
}

export async function setUserRole(userId: string, role: Role) {
  const result = await db.updateTable("user").set({ role, updatedAt: new Date() }).where("id", "=", userId).executeTakeFirst();
  return Number(result.numUpdatedRows) > 0;
}
