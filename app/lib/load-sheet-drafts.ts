// Converting between the editor's text cells and appliances; runs in the browser for live totals.
import type { Appliance } from "~/domain/load/load-sheet-types";
import type { ApplianceDraft } from "~/components/loads/appliance-row";

const ALL_MONTHS = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];

let counter = 0;
export function newDraft(partial: Partial<ApplianceDraft> = {}): ApplianceDraft {
  counter += 1;
  return {
    key: `row-${counter}`,
    name: "",
    powerW: "",
    quantity: "1",
    hoursPerDay: "",
    daysPerWeek: "7",
    circuit: "ac",
    surgeW: "",
    months: ALL_MONTHS,
    ...partial,
  };
}

export function applianceToDraft(a: Appliance): ApplianceDraft {
  return newDraft({
    name: a.name,
    powerW: String(a.powerW),
    quantity: String(a.quantity),
    hoursPerDay: String(a.hoursPerDay),
    daysPerWeek: String(a.daysPerWeek),
    circuit: a.circuit,
    surgeW: a.surgeW === undefined ? "" : String(a.surgeW),
    months: a.months ? [...a.months] : ALL_MONTHS,
  });
}

/** Text to number, keeping what cannot be read as the raw text so the server can name it. */
function num(text: string): number | string {
  const value = Number(text.trim().replace(",", "."));
  return text.trim() !== "" && Number.isFinite(value) ? value : text;
}

export function draftToPayload(d: ApplianceDraft) {
  return {
    name: d.name,
    powerW: num(d.powerW),
    quantity: num(d.quantity),
    hoursPerDay: num(d.hoursPerDay),
    daysPerWeek: num(d.daysPerWeek),
    circuit: d.circuit,
    ...(d.surgeW.trim() ? { surgeW: num(d.surgeW) } : {}),
    months: d.months.length === 12 ? undefined : d.months,
  };
}

/** The appliance when every cell reads as a number, else null (the totals skip the line). */
export function draftToAppliance(d: ApplianceDraft): Appliance | null {
  const p = draftToPayload(d);
  const numbers = [p.powerW, p.quantity, p.hoursPerDay, p.daysPerWeek, p.surgeW ?? 0];
  if (!d.name.trim() || numbers.some((n) => typeof n !== "number")) return null;
  return p as Appliance;
}
