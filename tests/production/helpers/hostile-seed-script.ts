// Run with tsx and DATABASE_URL of a throwaway database: the demo people, teams, catalogue,
// readings, sourcing and planning (scripts/lib/seed-*), without the demo quotes, which the hostile
// input test drafts itself through the quotes pages.
import { DEMO_PASSWORD, DEMO_TEAMS, DEMO_USERS } from "../../../data/demo/people";

const { db } = await import("../../../app/server/db.server");
const { auth } = await import("../../../app/server/auth.server");

const userIds = new Map<string, string>();
for (const person of DEMO_USERS) {
  const { user } = await auth.api.signUpEmail({ body: { name: person.name, email: person.email, password: DEMO_PASSWORD } });
  await db.updateTable("user").set({ role: person.role, emailVerified: true }).where("id", "=", user.id).execute();
  userIds.set(person.email, user.id);
}
for (const team of DEMO_TEAMS) {
  const owner = DEMO_USERS.find((u) => u.team?.slug === team.slug && u.team.membership === "owner")!;
  const created = await auth.api.createOrganization({ body: { name: team.name, slug: team.slug, userId: userIds.get(owner.email)! } });
  for (const person of DEMO_USERS.filter((u) => u.team?.slug === team.slug && u.team.membership === "member")) {
    await auth.api.addMember({ body: { userId: userIds.get(person.email)!, organizationId: created!.id, role: "member" } });
  }
}
const silent = () => {};
await (await import("../../../scripts/lib/seed-catalogue")).seedDemoCatalogue(db, silent);
await (await import("../../../scripts/lib/seed-readings")).seedDemoReadings(db, silent);
await (await import("../../../scripts/lib/seed-sourcing")).seedDemoSourcing(db, silent);
await (await import("../../../scripts/lib/seed-planning")).seedDemoPlanning(silent);
await db.destroy();
