// Submitting a field reading: what is stored, and every bad input refused at its field with
// nothing stored (no reading, no photo).
import { describe, expect, it } from "vitest";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { authedRequest, callRoute, countStored, createTestModule, readingFields, readingForm, submitReading, sweepCsv } from "./helpers";
import * as readingsNew from "~/routes/readings-new";
import { db } from "~/server/db.server";

const MB = 1024 * 1024;

describe("submitting a field reading", () => {
  it("stores a sweep reading as pending, normalised to STC, with its photo, in one go", async () => {
    const installer = await installerWithTeam("submit-ok");
    const module = await createTestModule("submit");
    const result = await submitReading(installer.client, readingForm(readingFields(module.id)));
    expect(result.status, JSON.stringify(result.data)).toBe(302);
    const id = result.location!.replace("/readings/", "");
    const row = await db.selectFrom("field_reading").selectAll().where("id", "=", id).executeTakeFirstOrThrow();
    expect(row).toMatchObject({
      status: "pending",
      kind: "sweep",
      module_id: module.id,
      submitted_by: installer.userId,
      team_id: installer.teamId,
      irradiance_source: "pyranometer",
      weight: 1,
      utc_offset_min: 120,
    });
    expect(new Date(row.taken_at).toISOString()).toBe("2026-06-14T11:10:00.000Z");
    expect(row.sweep).toHaveLength(60);
    expect(row.sweep_duration_s).toBeCloseTo(0.8, 9);
    // Cell = back sheet 43 °C + 0.94 × 3 °C (King et al. 2004); STC = P·(1000/940)/(1 − 0.004·(Tc − 25)).
    expect(row.cell_temp_c).toBeCloseTo(43 + 0.94 * 3, 9);
    expect(row.stc_pmax_w).toBeCloseTo((row.measured_pmax_w * (1000 / 940)) / (1 - 0.004 * (row.cell_temp_c - 25)), 9);
    expect(row.fill_factor).toBeGreaterThan(0.6);
    expect(row.normalisation).toMatchObject({ method: "pmax-gamma", cellTempSource: "back-sheet", nameplatePmaxW: 100 });
    const photo = await db
      .selectFrom("stored_file")
      .select(["content_type", "byte_size", "sha256", "uploaded_by"])
      .where("id", "=", row.photo_id!)
      .executeTakeFirstOrThrow();
    expect(photo).toMatchObject({ content_type: "image/png", uploaded_by: installer.userId });
    expect(photo.sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it("stores one reading given as voltage and current, with the clear-sky estimate weighted half", async () => {
    const installer = await installerWithTeam("submit-single");
    const module = await createTestModule("single");
    const fields = readingFields(module.id, {
      kind: "single",
      measuredVoltageV: "17.1",
      measuredCurrentA: "4.9",
      irradianceSource: "clear-sky-estimate",
      irradianceWm2: "",
      moduleTempC: "",
    });
    const result = await submitReading(installer.client, readingForm(fields));
    expect(result.status, JSON.stringify(result.data)).toBe(302);
    const row = await db.selectFrom("field_reading").selectAll().where("submitted_by", "=", installer.userId).executeTakeFirstOrThrow();
    expect(row.measured_pmax_w).toBeCloseTo(17.1 * 4.9, 9);
    expect(row.measured_vmp_v).toBe(17.1);
    expect(row.sweep).toBeNull();
    expect(row.weight).toBe(0.5);
    expect(row.module_temp_c).toBeNull();
    expect(row.flags.map((f) => f.code)).toEqual(["irradiance-estimated", "module-temperature-missing"]);
  });

  const badCases: [string, (moduleId: string) => FormData, string, RegExp][] = [
    [
      "a malformed CSV",
      (id) => readingForm(readingFields(id), { sweepFile: { name: "s.csv", type: "text/csv", bytes: "voltage,current\n0,5.4\n8.2,five\n12,5.1\n" } }),
      "sweepFile",
      /Row 3: current "five" is not a number/,
    ],
    [
      "a sweep with one point",
      (id) => readingForm(readingFields(id), { sweepFile: { name: "s.csv", type: "text/csv", bytes: "voltage,current\n17.2,5.0\n" } }),
      "sweepFile",
      /1 points; at least 10/,
    ],
    [
      "a photo that is really a text file",
      (id) => readingForm(readingFields(id), { photo: { name: "module.jpg", type: "image/jpeg", bytes: "Not a photo at all, just text pretending.\n" } }),
      "photo",
      /not a JPEG, PNG or WebP image/,
    ],
    [
      "a 5.5 MB photo",
      (id) => readingForm(readingFields(id), { photo: { name: "big.jpg", type: "image/jpeg", bytes: new Uint8Array(5.5 * MB).fill(0xff) } }),
      "photo",
      /larger than 5 MB/,
    ],
    ["no photo", (id) => readingForm(readingFields(id), { photo: null }), "photo", /Attach a photo/],
    [
      "a sweep without a file",
      (id) => readingForm(readingFields(id), { sweepFile: { name: "", type: "application/octet-stream", bytes: "" } }),
      "sweepFile",
      /Attach the load sweep/,
    ],
    ["one reading without a power", (id) => readingForm(readingFields(id, { kind: "single" })), "measuredPmaxW", /Enter the power, or both/],
    ["measured irradiance left out", (id) => readingForm(readingFields(id, { irradianceWm2: "" })), "irradianceWm2", /Enter the measured irradiance/],
    ["a time in the future", (id) => readingForm(readingFields(id, { takenAtLocal: "2099-06-14T12:00" })), "takenAtLocal", /in the future/],
    ["a time at night", (id) => readingForm(readingFields(id, { takenAtLocal: "2026-06-14T01:00" })), "takenAtLocal", /below the horizon/],
    ["a tilt of 120°", (id) => readingForm(readingFields(id, { tiltDeg: "120" })), "tiltDeg", /from 0 to 90/],
    ["latitude as words", (id) => readingForm(readingFields(id, { latitudeDeg: "north" })), "latitudeDeg", /as a number/],
    ["an unknown module", () => readingForm(readingFields("00000000-0000-4000-8000-000000000000")), "moduleId", /No such module/],
  ];

  it.each(badCases)("refuses %s at the field and stores nothing", async (_label, build, field, message) => {
    const installer = await installerWithTeam("submit-bad");
    const module = await createTestModule("bad");
    const result = await submitReading(installer.client, build(module.id));
    expect(result.status).toBe(400);
    expect(result.data.result.error[field]?.[0], JSON.stringify(result.data.result.error)).toMatch(message);
    expect(await countStored(installer.userId)).toEqual({ readings: 0, files: 0 });
  });

  it("refuses a 6 MB upload before reading it (413) and stores nothing", async () => {
    const installer = await installerWithTeam("submit-huge");
    const module = await createTestModule("huge");
    const form = readingForm(readingFields(module.id), { photo: { name: "huge.jpg", type: "image/jpeg", bytes: new Uint8Array(6 * MB).fill(0xd8) } });
    const body = await new Response(form).arrayBuffer();
    const contentType = new Response(form).headers.get("Content-Type")!;
    const declared = await callRoute(
      readingsNew.action,
      authedRequest(installer.client, "/readings/new", {
        method: "POST",
        body,
        headers: { "Content-Type": contentType, "Content-Length": String(body.byteLength) },
      }),
    );
    expect(declared.status).toBe(413);
    expect(declared.data.result.error.photo[0]).toMatch(/larger than 6 MB.*nothing was saved/);
    // Without a Content-Length (a streamed body), the count stops it too.
    const stream = new Blob([body]).stream();
    const streamed = await callRoute(
      readingsNew.action,
      authedRequest(installer.client, "/readings/new", {
        method: "POST",
        body: stream,
        headers: { "Content-Type": contentType },
        duplex: "half",
      } as RequestInit),
    );
    expect(streamed.status).toBe(413);
    expect(await countStored(installer.userId)).toEqual({ readings: 0, files: 0 });
  });

  it("is open only to installers with a team", async () => {
    const module = await createTestModule("who");
    const curator = await userWithRole("curator", "submit-curator");
    expect((await submitReading(curator.client, readingForm(readingFields(module.id)))).status).toBe(403);
    const anonymous = await callRoute(
      readingsNew.action,
      authedRequest(null, "/readings/new", { method: "POST", body: readingForm(readingFields(module.id)) }),
    );
    expect(anonymous.status).toBe(302);
    expect(anonymous.location).toMatch(/^\/sign-in/);
  });
});
