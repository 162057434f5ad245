// The invented demo catalogue passes the same checks a curator's form applies (the seed refuses
// otherwise), and holds the spread of kinds the demo promises.
import { describe, expect, it } from "vitest";
import { DEMO_MODULES } from "../../../data/demo/modules";
import { DEMO_BATTERIES, DEMO_CONTROLLERS, DEMO_INVERTERS } from "../../../data/demo/parts";
import { batteryFormSchema, controllerFormSchema, inverterFormSchema, moduleFormSchema } from "~/lib/catalogue-forms";

describe("demo catalogue", () => {
  it("every demo part passes validation", () => {
    const failures = [
      ...DEMO_MODULES.map((m) => [m.model, moduleFormSchema.safeParse({ nominalTempKind: "noct", ...m })] as const),
      ...DEMO_BATTERIES.map((b) => [b.model, batteryFormSchema.safeParse(b)] as const),
      ...DEMO_CONTROLLERS.map((c) => [c.model, controllerFormSchema.safeParse(c)] as const),
      ...DEMO_INVERTERS.map((i) => [i.model, inverterFormSchema.safeParse(i)] as const),
    ].filter(([, r]) => !r.success);
    expect(failures.map(([model, r]) => `${model}: ${r.error?.message}`)).toEqual([]);
  });

  it("holds about forty modules across technologies, and each battery and controller type", () => {
    expect(DEMO_MODULES.length).toBeGreaterThanOrEqual(40);
    expect(new Set(DEMO_MODULES.map((m) => m.cellTechnology)).size).toBeGreaterThanOrEqual(6);
    expect(new Set(DEMO_MODULES.map((m) => `${m.maker} ${m.model}`)).size).toBe(DEMO_MODULES.length);
    expect(new Set(DEMO_BATTERIES.map((b) => b.chemistry))).toEqual(new Set(["lead-acid-agm", "lead-acid-gel", "lead-acid-flooded", "lifepo4"]));
    expect(new Set(DEMO_CONTROLLERS.map((c) => c.kind))).toEqual(new Set(["pwm", "mppt"]));
    expect(DEMO_INVERTERS.length).toBeGreaterThanOrEqual(4);
  });
});
