// Team queries. Every query is scoped by the acting team's id in SQL.
import { db } from "./db.server";

export function listMembers(teamId: string) {
  return db
    .selectFrom("member")
    .innerJoin("user", "user.id", "member.userId")
    .select(["member.id as memberId", "user.id as userId", "user.name", "user.email", "member.role", "member.createdAt"])
    .where("member.organizationId", "=", teamId)
    .orderBy("member.createdAt")
    .execute();
}

export function listPendingInvitations(teamId: string) {
  return db
    .selectFrom("invitation")
    .select(["id", "email", "expiresAt", "createdAt"])
    .where("organizationId", "=", teamId)
    .where("status", "=", "pending")
    .where("expiresAt", ">", new Date())
    .orderBy("createdAt", "desc")
    .execute();
}

export function findInvitation(invitationId: string) {
  return db
    .selectFrom("invitation")
    .innerJoin("organization", "organization.id", "invitation.organizationId")
    .innerJoin("user as inviter", "inviter.id", "invitation.inviterId")
    .select([
      "invitation.id",
      "invitation.email",
      "invitation.status",
      "invitation.expiresAt",
      "organization.id as teamId",
      "organization.name as teamName",
      "inviter.name as inviterName",
    ])
    .where("invitation.id", "=", invitationId)
    .executeTakeFirst();
}

export function slugForTeam(name: string) {
  const base = name
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .slice(0, 40);
  return `${base || "team"}-${crypto.randomUUID().slice(0, 6)}`;
}
