import { describe, expect, it } from "vitest";
import { yieldRequestSchema, zodIssuesToFields } from "~/domain/solar/yield-request";
import { TEST_LOSSES, TEST_MODULE, madisonSite } from "./yield-fixtures";

type Body = Record<string, any>;

function validBody(): Body {
  return structuredClone({
    site: madisonSite(),
    module: TEST_MODULE,
    controller: { kind: "mppt", batteryVoltageV: 12, efficiencyPct: 97 },
    lossesPct: TEST_LOSSES,
  });
}

function fieldsFor(change: (body: Body) => void): Record<string, string> {
  const body = validBody();
  change(body);
  const parsed = yieldRequestSchema.safeParse(body);
  if (parsed.success) return {};
  return zodIssuesToFields(parsed.error);
}

describe("POST /api/v1/yield body", () => {
  it("accepts the documented body and defaults the power basis to nameplate", () => {
    const parsed = yieldRequestSchema.safeParse(validBody());
    expect(parsed.success).toBe(true);
    if (parsed.success) {
      expect(parsed.data.powerBasis).toBe("nameplate");
      expect(parsed.data.site.months).toHaveLength(12);
      expect(parsed.data.module).toEqual(TEST_MODULE);
    }
  });

  it("accepts a catalogue module with verified power, and clearness-index months", () => {
    const body = validBody();
    body.module = { moduleId: "mod_7f3a" };
    body.powerBasis = "verified";
    body.site.months[5] = { clearnessIndex: 0.55, tMaxC: 25, tMinC: 13 };
    const parsed = yieldRequestSchema.safeParse(body);
    expect(parsed.success).toBe(true);
    if (parsed.success) expect(parsed.data.module).toEqual({ moduleId: "mod_7f3a" });
  });

  const cases: Array<[string, (body: Body) => void, string, RegExp]> = [
    ["irradiation above the physical bound", (b) => (b.site.months[3].ghiKWhM2Day = 16.05), "site.months.3.ghiKWhM2Day", /at most 12/],
    ["irradiation in MJ instead of kWh", (b) => (b.site.months[3].ghiKWhM2Day = 9.5), "site.months.3.ghiKWhM2Day", /Check the units/],
    ["negative irradiation", (b) => (b.site.months[0].ghiKWhM2Day = -1), "site.months.0.ghiKWhM2Day", /at least 0/],
    ["both irradiation and clearness index", (b) => (b.site.months[2].clearnessIndex = 0.5), "site.months.2.clearnessIndex", /not both/],
    ["neither irradiation nor clearness index", (b) => delete b.site.months[7].ghiKWhM2Day, "site.months.7.ghiKWhM2Day", /clearness index/],
    ["clearness index of 1", (b) => (b.site.months[4] = { clearnessIndex: 1, tMaxC: 20, tMinC: 8 }), "site.months.4.clearnessIndex", /less than 1/],
    ["minimum above maximum temperature", (b) => (b.site.months[6].tMinC = 30), "site.months.6.tMinC", /not be above the maximum/],
    ["temperature out of range", (b) => (b.site.months[6].tMaxC = 75), "site.months.6.tMaxC", /at most 60/],
    ["eleven months", (b) => b.site.months.pop(), "site.months", /exactly 12 months/],
    ["latitude beyond the pole", (b) => (b.site.latitudeDeg = 91), "site.latitudeDeg", /at most 90/],
    ["longitude out of range", (b) => (b.site.longitudeDeg = -181), "site.longitudeDeg", /at least -180/],
    ["tilt above vertical", (b) => (b.site.tiltDeg = 95), "site.tiltDeg", /at most 90/],
    ["azimuth out of range", (b) => (b.site.azimuthDeg = 400), "site.azimuthDeg", /at most 360/],
    ["albedo above 1", (b) => (b.site.months[0].albedo = 1.2), "site.months.0.albedo", /at most 1/],
    ["missing site", (b) => delete b.site, "site", /Site is required/],
    ["text where a number belongs", (b) => (b.site.tiltDeg = "steep"), "site.tiltDeg", /must be a number/],
    ["Vmp above Voc", (b) => (b.module.vmpV = 23), "module.vmpV", /below Voc/],
    ["Imp above Isc", (b) => (b.module.impA = 6), "module.impA", /below Isc/],
    ["Pmax far from Vmp × Imp", (b) => (b.module.pmaxW = 130), "module.pmaxW", /Vmp × Imp/],
    ["a missing datasheet figure", (b) => delete b.module.noctC, "module.noctC", /Required/],
    ["positive gamma", (b) => (b.module.gammaPmaxPctPerC = 0.4), "module.gammaPmaxPctPerC", /at most 0/],
    ["zero Isc", (b) => (b.module.iscA = 0), "module.iscA", /more than 0/],
    ["moduleId and datasheet figures together", (b) => (b.module.moduleId = "mod_1"), "module.moduleId", /not both/],
    ["an empty module", (b) => (b.module = {}), "module.moduleId", /catalogue module/],
    ["verified power without a catalogue module", (b) => (b.powerBasis = "verified"), "powerBasis", /catalogue module/],
    ["an unknown controller kind", (b) => (b.controller.kind = "shunt"), "controller.kind", /"mppt" or "pwm"/],
    ["a 36 V battery", (b) => (b.controller.batteryVoltageV = 36), "controller.batteryVoltageV", /12, 24 or 48/],
    ["controller efficiency below 50 %", (b) => (b.controller.efficiencyPct = 40), "controller.efficiencyPct", /at least 50/],
    ["a 60 % wiring loss", (b) => (b.lossesPct.wiring = 60), "lossesPct.wiring", /at most 50/],
  ];

  it.each(cases)("rejects %s at the right field", (_label, change, path, message) => {
    const fields = fieldsFor(change);
    expect(Object.keys(fields)).toContain(path);
    expect(fields[path]).toMatch(message);
  });

  it("reports every bad field of a body at once, with dot paths", () => {
    const fields = fieldsFor((b) => {
      b.site.months[3].ghiKWhM2Day = 20;
      b.module.vmpV = 25;
      b.lossesPct.soiling = -1;
    });
    expect(Object.keys(fields).sort()).toEqual(["lossesPct.soiling", "module.pmaxW", "module.vmpV", "site.months.3.ghiKWhM2Day"]);
  });

  it("names a body that is not an object", () => {
    const parsed = yieldRequestSchema.safeParse("hello");
    expect(parsed.success).toBe(false);
    if (!parsed.success) expect(zodIssuesToFields(parsed.error)).toEqual({ body: "The request body must be an object." });
  });
});
