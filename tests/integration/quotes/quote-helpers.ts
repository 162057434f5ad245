// A saved kit plan with one supplier offer for its module, and the quote editor's form as fields.
import { installerWithTeam } from "../helpers/fixtures";
import { choices, planningSetup } from "../helpers/planning-fixtures";
import type { RouteClient } from "../helpers/route-client";
import * as plansNew from "~/routes/plans-new";
import { db } from "~/server/db.server";
import type { QuoteEditorForm } from "~/lib/quote-forms";

export async function teamWithPlan(label: string, { moduleUnitPrice = "100.00" } = {}) {
  const team = await installerWithTeam(label);
  const setup = await planningSetup(team.teamId);
  const supplier = await db
    .insertInto("supplier")
    .values({ team_id: team.teamId, name: `Supplier ${label}`, currency: "EUR" })
    .returning("id")
    .executeTakeFirstOrThrow();
  await db
    .insertInto("offer")
    .values({ team_id: team.teamId, supplier_id: supplier.id, part_kind: "modules", part_id: setup.moduleId, currency: "EUR", unit_price: moduleUnitPrice })
    .execute();
  const saved = await team.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
  if (saved.status !== 302) throw new Error(`plan not saved: ${JSON.stringify(saved.data)}`);
  const planId = saved.location!.split("/").pop()!;
  return { ...team, setup, planId };
}

/** The editor's values as the browser would post them (lines[0].description, …). */
export function editorForm(values: QuoteEditorForm, intent = "save"): Record<string, string> {
  const form: Record<string, string> = { intent };
  for (const [key, value] of Object.entries(values)) {
    if (key === "lines" || value === undefined) continue;
    form[key] = String(value);
  }
  values.lines.forEach((line, i) => {
    for (const [key, value] of Object.entries(line)) if (value !== undefined) form[`lines[${i}].${key}`] = String(value);
  });
  return form;
}

export async function customerClientFor(client: RouteClient) {
  return client;
}
