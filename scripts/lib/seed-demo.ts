// Loads the invented demo scenario. Idempotent: each person, team and part is created only when absent.
import { DEMO_PASSWORD, DEMO_TEAMS, DEMO_USERS } from "../../data/demo/people";

export async function seedDemo(log: (line: string) => void = () => {}) {
  const { db } = await import("../../app/server/db.server");
  const { auth } = await import("../../app/server/auth.server");

  const userIds = new Map<string, string>();
  for (const person of DEMO_USERS) {
    const existing = await db.selectFrom("user").select("id").where("email", "=", person.email).executeTakeFirst();
    let id = existing?.id;
    if (!id) {
      const { user } = await auth.api.signUpEmail({ body: { name: person.name, email: person.email, password: DEMO_PASSWORD } });
      id = user.id;
      log(`user ${person.email}`);
    }
    await db.updateTable("user").set({ role: person.role, emailVerified: true }).where("id", "=", id).execute();
    userIds.set(person.email, id);
  }

  for (const team of DEMO_TEAMS) {
    let org = await db.selectFrom("organization").select("id").where("slug", "=", team.slug).executeTakeFirst();
    const owner = DEMO_USERS.find((u) => u.team?.slug === team.slug && u.team.membership === "owner")!;
    if (!org) {
      const created = await auth.api.createOrganization({ body: { name: team.name, slug: team.slug, userId: userIds.get(owner.email)! } });
      org = { id: created!.id };
      log(`team ${team.name}`);
    }
    for (const person of DEMO_USERS.filter((u) => u.team?.slug === team.slug && u.team.membership === "member")) {
      const userId = userIds.get(person.email)!;
      const member = await db.selectFrom("member").select("id").where("organizationId", "=", org.id).where("userId", "=", userId).executeTakeFirst();
      if (!member) await auth.api.addMember({ body: { userId, organizationId: org.id, role: "member" } });
    }
  }
  const { seedDemoCatalogue } = await import("./seed-catalogue");
  await seedDemoCatalogue(db, log);
  await (await import("./seed-readings")).seedDemoReadings(db, log);
  await (await import("./seed-sourcing")).seedDemoSourcing(db, log);
  await (await import("./seed-planning")).seedDemoPlanning(log);
  await (await import("./seed-quotes")).seedDemoQuotes(log);
}

/** Seeds only a database with no users yet, so `npm start` never overwrites someone's work. */
export async function seedIfEmpty() {
  const { db } = await import("../../app/server/db.server");
  const { count } = await db
    .selectFrom("user")
    .select((eb) => eb.fn.countAll<number>().as("count"))
    .executeTakeFirstOrThrow();
  if (Number(count) > 0) return false;
  await seedDemo();
  return true;
}
