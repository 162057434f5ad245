// Offer CSV import, row by row: a team's own export imports again even when one of its offers has
// expired (that offer is left exactly as stored and the report says so), while an expired price that
// is not already stored is still refused; and a row's problems are listed all at once, in column order.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { insertBattery, insertModule, uniqueMaker } from "./helpers";
import * as importRoute from "~/routes/sourcing.import";
import * as exportRoute from "~/routes/sourcing.export";
import { db } from "~/server/db.server";
import { todayIso } from "~/domain/sourcing/offer-validity";

const HEADER =
  "supplier,kind,maker,model,sku,currency,unit_price,price_breaks,minimum_order,shipping_per_unit,shipping_per_order,lead_time_days,stock,valid_until,notes";

async function teamWithOffers(label: string) {
  const a = await installerWithTeam(label);
  const maker = uniqueMaker(label);
  await insertModule(maker, "QP-150P", 150, 126);
  await insertModule(maker, "FM-120M", 120, 118.8);
  const batteryId = await insertBattery(maker, "LFP-100");
  const csv = [
    HEADER,
    `Kestrel Row,module,${maker},QP-150P,K-1,EUR,57.45,10:55.90; 40:54.40,2,0.80,35.00,6,60,2099-06-30,Winter list`,
    `Kestrel Row,module,${maker},FM-120M,K-2,,47.90,,,0.80,35.00,6,48,,`,
    `Kestrel Row,battery,${maker},LFP-100,K-3,,415.00,4:405.00,,6.50,35.00,8,10,2099-01-31,`,
  ].join("\n");
  const done = await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: csv });
  expect(done.status).toBe(302);
  // The battery's price ran out: the supplier's list was valid until the end of January 2020.
  await db.updateTable("offer").set({ valid_until: "2020-01-31" }).where("team_id", "=", a.teamId).where("part_id", "=", batteryId).execute();
  return { ...a, maker, batteryId };
}

async function storedOffers(teamId: string) {
  const offers = await db
    .selectFrom("offer")
    .select(["id", "part_id", "unit_price", "shipping_per_unit", "notes", "updated_at"])
    .select((eb) => eb.cast<string>("valid_until", "text").as("valid_until"))
    .where("team_id", "=", teamId)
    .orderBy("id")
    .execute();
  const suppliers = await db.selectFrom("supplier").select("id").where("team_id", "=", teamId).execute();
  return { offers, suppliers: suppliers.length };
}

describe("importing a team's own export with an expired offer", () => {
  it("leaves the expired offer as it is, reports it as a note, and writes nothing new", async () => {
    const a = await teamWithOffers("rt-expired");
    const before = await storedOffers(a.teamId);
    expect(before.offers).toHaveLength(3);

    const exported = await a.client.loader(exportRoute, "/sourcing/export");
    expect(exported.data).toContain(",2020-01-31,");
    const check = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: exported.data });
    expect(check.status).toBe(200);
    expect(check.data.report).toMatchObject({ rowCount: 3, readyCount: 2, problems: [], fileErrors: [], newOffers: 0, updatedOffers: 2, newSuppliers: [] });
    expect(check.data.report.expiredKept).toEqual([{ row: expect.any(Number), label: `Kestrel Row · ${a.maker} LFP-100`, validUntil: "2020-01-31" }]);

    const done = await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: exported.data });
    expect(done.status).toBe(302);
    const after = await storedOffers(a.teamId);
    expect(after.suppliers).toBe(before.suppliers);
    expect(after.offers).toHaveLength(3);
    const battery = (rows: typeof before.offers) => rows.find((o) => o.part_id === a.batteryId)!;
    // Not even rewritten: the stored row (and its time of last change) is exactly as it was.
    expect(battery(after.offers)).toEqual(battery(before.offers));
    // The two current offers get the file's terms, which are their own.
    for (const o of after.offers) {
      const old = before.offers.find((b) => b.id === o.id)!;
      expect([o.unit_price, o.shipping_per_unit, o.notes, o.valid_until]).toEqual([old.unit_price, old.shipping_per_unit, old.notes, old.valid_until]);
    }
  });

  it("refuses an exported expired row whose price was edited, and writes nothing", async () => {
    const a = await teamWithOffers("rt-edited-expired");
    const before = await storedOffers(a.teamId);
    const exported = (await a.client.loader(exportRoute, "/sourcing/export")).data as string;
    const lines = exported.trim().split("\n");
    const batteryLine = lines.findIndex((line) => line.includes("LFP-100"));
    expect(lines[batteryLine]).toContain(",415.00,");
    lines[batteryLine] = lines[batteryLine].replace(",415.00,", ",399.00,");
    const check = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: lines.join("\n") });
    const problems = check.data.report.problems as { row: number; errors: { column: string; message: string }[] }[];
    expect(problems).toEqual([
      {
        row: batteryLine + 1,
        label: `Kestrel Row · ${a.maker} LFP-100`,
        errors: [
          {
            column: "unit_price",
            message:
              "This row changes the price of an offer that expired on 2020-01-31: ask the supplier for a current price and date, or leave the row as exported.",
          },
        ],
      },
    ]);
    expect(check.data.report.expiredKept).toEqual([]);
    expect((await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: lines.join("\n") })).status).toBe(400);
    expect(await storedOffers(a.teamId)).toEqual(before);
  });

  it("still refuses an expired price that is not the stored offer, and writes nothing", async () => {
    const a = await teamWithOffers("rt-new-expired");
    const before = await storedOffers(a.teamId);
    const today = todayIso();
    const file = [
      HEADER,
      `Kestrel Row,battery,${a.maker},LFP-100,K-3,,399.00,,,,,,,2021-03-31,`, // row 2: stored offer, another expired day
      `Kestrel Row,module,${a.maker},QP-150P,K-1,,50.00,,,,,,,2020-01-31,`, // row 3: a current stored offer, replaced by an expired price
      `Harrow Supply,module,${a.maker},FM-120M,H-1,EUR,41.00,,,,,,,2020-01-31,`, // row 4: a new supplier's expired offer
      `Kestrel Row,battery,${a.maker},LFP-100,K-3,,415.00,4:405.00,,6.50,35.00,8,10,2020-01-31,`, // row 5: kept, but row 2 names the same offer
    ].join("\n");
    const check = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: file });
    const problems = check.data.report.problems as { row: number; errors: { column: string; message: string }[] }[];
    expect(problems.map((p) => [p.row, p.errors.map((e) => e.column)])).toEqual([
      [2, ["valid_until"]],
      [3, ["valid_until"]],
      [4, ["valid_until"]],
      [5, ["model"]],
    ]);
    expect(problems[0].errors[0].message).toBe(
      `The offer expired on 2021-03-31 (today is ${today}): ask the supplier for a current price, or leave the row out.`,
    );
    expect(problems[2].errors[0].message).toMatch(/expired on 2020-01-31/);

    const refused = await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: file });
    expect(refused.status).toBe(400);
    expect(await storedOffers(a.teamId)).toEqual(before);
  });
});

describe("a row with several problems", () => {
  it("lists an unknown model and a bad price together, in column order", async () => {
    const a = await installerWithTeam("rows-merged");
    const maker = uniqueMaker("merged");
    await insertModule(maker, "QP-150P", 150, 126);
    const file = [
      HEADER,
      `Kestrel Row,module,${maker},QP-150P,K-1,EUR,57.45,,,,,,,,`, // row 2: fine
      `Kestrel Row,module,${maker},QP-999,K-2,,12.5.0,,,,,,,,`, // row 3: unknown model and bad price
      `New Co,module,${maker},QP-998,,,abc,,,,,,,2020-01-31,`, // row 4: new supplier without currency, unknown model, bad price, expired
      `Kestrel Row,module,${maker},QP-150P,K-3,,x1,,,,,,,,`, // row 5: bad price and a repeat of row 2
      `Kestrel Row,panel,${maker},QP-150P,K-4,,1.5.0,,,,,,,,`, // row 6: unknown kind (no lookup possible) and bad price
    ].join("\n");
    const check = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: file });
    const report = check.data.report;
    const columns = Object.fromEntries((report.problems as { row: number; errors: { column: string }[] }[]).map((p) => [p.row, p.errors.map((e) => e.column)]));
    expect(columns).toEqual({
      3: ["model", "unit_price"],
      4: ["model", "currency", "unit_price", "valid_until"],
      5: ["model", "unit_price"],
      6: ["kind", "unit_price"],
    });
    const row3 = report.problems.find((p: { row: number }) => p.row === 3).errors;
    expect(row3[0].message).toMatch(/No module ".* QP-999" in the catalogue/);
    expect(row3[1].message).toMatch(/The unit price must be a plain number/);
    const row5 = report.problems.find((p: { row: number }) => p.row === 5).errors;
    expect(row5[0].message).toMatch(/Row 2 already has an offer from Kestrel Row/);
    expect(report.readyCount).toBe(1);
  });
});
