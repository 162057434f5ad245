// Demo catalogue parts: inserted when absent (matched on maker + model), so running the seed again
// changes nothing. Every part goes through the same validation the curator's forms use.
import type { Kysely } from "kysely";
import type { Database } from "../../app/server/db-schema";
import { DEMO_MODULES } from "../../data/demo/modules";
import { DEMO_BATTERIES, DEMO_CONTROLLERS, DEMO_INVERTERS } from "../../data/demo/parts";
import { PART_FORM_SCHEMAS } from "../../app/lib/catalogue-forms";
import { partRow } from "../../app/server/catalogue/part-save.server";
import { PART_TABLES } from "../../app/server/catalogue/part-rows.server";
import type { PartKind } from "../../app/domain/catalogue/part-kinds";
import type { PartForm } from "../../app/lib/catalogue-forms";

function checked(kind: PartKind, part: object): PartForm {
  const parsed = PART_FORM_SCHEMAS[kind].safeParse(part);
  if (!parsed.success) throw new Error(`Demo ${kind} part fails validation: ${JSON.stringify(part)} — ${parsed.error.message}`);
  return parsed.data as PartForm;
}

export async function seedDemoCatalogue(db: Kysely<Database>, log: (line: string) => void) {
  const sets: [PartKind, object[]][] = [
    ["modules", DEMO_MODULES.map((m) => ({ nominalTempKind: "noct", ...m }))],
    ["batteries", DEMO_BATTERIES],
    ["controllers", DEMO_CONTROLLERS],
    ["inverters", DEMO_INVERTERS],
  ];
  for (const [kind, parts] of sets) {
    const rows = parts.map((p) => partRow(kind, checked(kind, p)));
    const inserted = await db
      .insertInto(PART_TABLES[kind] as "battery")
      .values(rows as never[])
      .onConflict((oc) => oc.columns(["maker", "model"]).doNothing())
      .returning("id")
      .execute();
    if (inserted.length) log(`${inserted.length} demo ${kind}`);
  }
}
