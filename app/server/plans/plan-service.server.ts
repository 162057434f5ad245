// From raw choices (form JSON or API body) to a computed plan, with every problem as a field message.
import { zodIssuesToFields } from "~/domain/solar/yield-request";
import { planChoicesSchema, type PlanChoices } from "~/lib/plan-choices";
import { jsonTextProblem } from "~/lib/text-checks";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import { buildPlanInput, type PlanSources } from "./plan-inputs.server";
import { computePlan } from "./plans.server";

export type PlanFromChoices =
  { ok: true; choices: PlanChoices; input: KitPlanInput; plan: KitPlan; sources: PlanSources } | { ok: false; message: string; fields: Record<string, string> };

export async function planFromChoices(teamId: string, body: unknown): Promise<PlanFromChoices> {
  // JSON from the API or the page's hidden field can carry "\u0000" or a lone surrogate escape,
  // which the plan's JSON columns cannot store.
  const unstorable = jsonTextProblem(body, "The plan's name");
  if (unstorable) return { ok: false, message: unstorable, fields: { name: unstorable } };
  const parsed = planChoicesSchema.safeParse(body);
  if (!parsed.success) return { ok: false, message: "Some choices need attention.", fields: zodIssuesToFields(parsed.error) };
  const built = await buildPlanInput(teamId, parsed.data);
  if (!built.ok) return { ok: false, message: "Some choices need attention.", fields: built.fields };
  const computed = computePlan(built.input);
  if (!computed.ok) return { ok: false, message: "The site, loads or parts have figures the planner cannot use.", fields: computed.fields };
  return { ok: true, choices: parsed.data, input: built.input, plan: computed.plan, sources: built.sources };
}

/** Reads the page form's hidden JSON field. */
export function choicesFromForm(formData: FormData): unknown {
  const raw = formData.get("choices");
  try {
    return JSON.parse(typeof raw === "string" ? raw : "");
  } catch {
    return null;
  }
}
