// Merging duplicate models: readings move to the survivor, its verified figures are recomputed,
// and the duplicate disappears from lists while its page points to the survivor.
import { describe, expect, it } from "vitest";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { addReadings, insertModule, uniqueMaker } from "./catalogue-fixtures";
import * as catalogue from "~/routes/catalogue";
import * as moduleMerge from "~/routes/catalogue.module-merge";
import * as modulePage from "~/routes/catalogue.module";
import * as partEdit from "~/routes/catalogue.part-edit";
import { db } from "~/server/db.server";
import { median, scaledMad } from "~/domain/catalogue/robust-stats";

describe("merging duplicate models", () => {
  it("moves every reading to the survivor and recomputes its verified figures", async () => {
    const curator = await userWithRole("curator", "merge");
    const maker = uniqueMaker("merge");
    const survivor = await insertModule(maker, "M-100");
    const duplicate = await insertModule(maker, "M-100 (typo)");
    await addReadings(survivor, [86, 88]);
    await addReadings(duplicate, [90, 84, 87]);
    await addReadings(duplicate, [60], "pending");
    expect((await db.selectFrom("pv_module").select("verified_pmax_w").where("id", "=", survivor).executeTakeFirstOrThrow()).verified_pmax_w).toBe(87);

    const result = await curator.client.action(
      moduleMerge,
      `/catalogue/modules/${duplicate}/merge`,
      { survivorId: survivor, confirm: "yes" },
      { moduleId: duplicate },
    );
    expect(result.status, JSON.stringify(result.data)).toBe(302);
    expect(result.location).toBe(`/catalogue/modules/${survivor}`);

    const readings = await db.selectFrom("field_reading").select(["module_id", "status"]).where("module_id", "in", [survivor, duplicate]).execute();
    expect(readings).toHaveLength(6);
    expect(readings.every((r) => r.module_id === survivor)).toBe(true);
    // Approved values 86, 88, 90, 84, 87 (equal weights): median 87; spread = 100 · scaled MAD / median
    // (Rousseeuw & Croux 1993: MAD 1 → 1.4826), as recomputeVerifiedFigures defines it.
    const approved = [86, 88, 90, 84, 87];
    const figures = await db
      .selectFrom("pv_module")
      .select(["verified_pmax_w", "verified_reading_count", "verified_spread_pct", "verified_ratio", "merged_into"])
      .where("id", "in", [survivor, duplicate])
      .orderBy("merged_into", "desc")
      .execute();
    const [dup, surv] = [figures.find((f) => f.merged_into === survivor)!, figures.find((f) => f.merged_into === null)!];
    expect(surv.verified_pmax_w).toBe(median(approved));
    expect(surv.verified_reading_count).toBe(5);
    expect(surv.verified_spread_pct).toBeCloseTo((100 * scaledMad(approved)) / 87, 10);
    expect(surv.verified_spread_pct).toBeCloseTo((100 * 1.4826) / 87, 10);
    expect(surv.verified_ratio).toBeCloseTo(0.87, 10);
    expect(dup).toMatchObject({ verified_pmax_w: null, verified_reading_count: 0, verified_spread_pct: null });

    const installer = await installerWithTeam("merge-reader");
    const list = await installer.client.loader(catalogue, `/catalogue?q=${encodeURIComponent(maker)}`);
    expect(list.data.page.items.map((m: { id: string }) => m.id)).toEqual([survivor]);
    const page = await installer.client.loader(modulePage, `/catalogue/modules/${duplicate}`, { moduleId: duplicate });
    expect(page.status).toBe(200);
    expect(page.data.mergedInto).toEqual({ id: survivor, maker, model: "M-100" });
    expect((await curator.client.loader(partEdit, `/catalogue/modules/${duplicate}/edit`, { kind: "modules", partId: duplicate })).status).toBe(409);
  });

  it("refuses a merge into itself, into a merged model, or without confirmation — changing nothing", async () => {
    const curator = await userWithRole("curator", "merge-refuse");
    const maker = uniqueMaker("mergeno");
    const a = await insertModule(maker, "A");
    const b = await insertModule(maker, "B");
    const c = await insertModule(maker, "C");
    await addReadings(a, [95]);
    const self = await curator.client.action(moduleMerge, `/catalogue/modules/${a}/merge`, { survivorId: a, confirm: "yes" }, { moduleId: a });
    expect(self.status).toBe(400);
    expect(self.data.result.error.survivorId[0]).toMatch(/cannot be merged into itself/);
    const unconfirmed = await curator.client.action(moduleMerge, `/catalogue/modules/${a}/merge`, { survivorId: b }, { moduleId: a });
    expect(unconfirmed.status).toBe(400);
    expect(unconfirmed.data.result.error.confirm[0]).toMatch(/Tick the box/);

    expect((await curator.client.action(moduleMerge, `/catalogue/modules/${b}/merge`, { survivorId: c, confirm: "yes" }, { moduleId: b })).status).toBe(302);
    const intoMerged = await curator.client.action(moduleMerge, `/catalogue/modules/${a}/merge`, { survivorId: b, confirm: "yes" }, { moduleId: a });
    expect(intoMerged.status).toBe(400);
    expect(intoMerged.data.result.error.survivorId[0]).toMatch(/itself merged away/);
    const reading = await db.selectFrom("field_reading").select("module_id").where("module_id", "in", [a, b, c]).execute();
    expect(reading).toEqual([{ module_id: a }]);
  });

  it("points earlier duplicates of the duplicate at the new survivor", async () => {
    const curator = await userWithRole("curator", "merge-chain");
    const maker = uniqueMaker("chain");
    const [x, y, z] = [await insertModule(maker, "X"), await insertModule(maker, "Y"), await insertModule(maker, "Z")];
    expect((await curator.client.action(moduleMerge, `/catalogue/modules/${x}/merge`, { survivorId: y, confirm: "yes" }, { moduleId: x })).status).toBe(302);
    expect((await curator.client.action(moduleMerge, `/catalogue/modules/${y}/merge`, { survivorId: z, confirm: "yes" }, { moduleId: y })).status).toBe(302);
    const rows = await db.selectFrom("pv_module").select(["model", "merged_into"]).where("maker", "=", maker).orderBy("model").execute();
    expect(rows).toEqual([
      { model: "X", merged_into: z },
      { model: "Y", merged_into: z },
      { model: "Z", merged_into: null },
    ]);
  });
});
