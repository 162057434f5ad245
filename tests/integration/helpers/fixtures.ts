// People and teams for integration tests, made through the same routes a user goes through.
import { expect } from "vitest";
import { RouteClient, uniqueEmail } from "./route-client";
import * as signUp from "~/routes/sign-up";
import * as teamNew from "~/routes/team-new";
import { db } from "~/server/db.server";
import { listOutbox } from "~/server/outbox.server";
import type { Role } from "~/lib/roles";

export const PASSWORD = "correct-horse-battery";

export async function signUpUser(label: string, name = `Test ${label}`) {
  const client = new RouteClient();
  const email = uniqueEmail(label);
  const result = await client.action(signUp, "/sign-up", { name, email, password: PASSWORD });
  expect(result.status, JSON.stringify(result.data)).toBe(302);
  const user = await db.selectFrom("user").select(["id", "email"]).where("email", "=", email).executeTakeFirstOrThrow();
  return { client, email, userId: user.id };
}

export async function installerWithTeam(label: string) {
  const person = await signUpUser(label);
  const teamName = `Team ${label} ${person.userId.slice(0, 5)}`;
  const result = await person.client.action(teamNew, "/team/new", { name: teamName });
  expect(result.status).toBe(302);
  const team = await db.selectFrom("organization").select("id").where("name", "=", teamName).executeTakeFirstOrThrow();
  return { ...person, teamId: team.id, teamName };
}

/** Role changes are an admin's job; tests set them directly. */
export async function userWithRole(role: Role, label: string = role) {
  const person = await signUpUser(label);
  await db.updateTable("user").set({ role }).where("id", "=", person.userId).execute();
  return person;
}

export async function latestMailTo(email: string) {
  for (let attempt = 0; attempt < 50; attempt++) {
    const [message] = await listOutbox(email);
    if (message) return message;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No e-mail reached ${email}`);
}

export function firstLink(text: string, pathPrefix: string) {
  const match = text.match(new RegExp(`https?://[^\\s"<]+${pathPrefix.replace(/\//g, "\\/")}[^\\s"<]*`));
  if (!match) throw new Error(`No link to ${pathPrefix} in: ${text}`);
  return new URL(match[0].replace(/&amp;/g, "&"));
}

let moduleCounter = 0;
/** An invented 100 W module, unique per call (γ −0.40 %/°C, NOCT 45 °C). */
export async function createTestModule(label: string) {
  moduleCounter += 1;
  return db
    .insertInto("pv_module")
    .values({
      maker: "Testbrook Cells",
      model: `TB-${label}-${Date.now().toString(36)}-${moduleCounter}`,
      cell_technology: "mono-PERC",
      cells_in_series: 36,
      pmax_w: 100,
      vmp_v: 18.2,
      imp_a: 5.5,
      voc_v: 22.1,
      isc_a: 5.9,
      gamma_pmax_pct_per_c: -0.4,
      beta_voc_pct_per_c: -0.3,
      alpha_isc_pct_per_c: 0.05,
      noct_c: 45,
      length_mm: 1000,
      width_mm: 670,
      mass_kg: 7,
    })
    .returning(["id", "model"])
    .executeTakeFirstOrThrow();
}
