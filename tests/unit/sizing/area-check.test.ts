// The plan's array-area check against hand figures (invented module sizes; the limit is the
// installer's own, so there is no published value to cite: plain arithmetic, length × width × count).
import { describe, expect, it } from "vitest";
import { arrayAreaCheck } from "~/domain/sizing/area-check";
import { planKit } from "~/domain/sizing/kit-plan";
import type { ModulePart } from "~/domain/sizing/parts";
import { TEST_MODULE } from "../solar/yield-fixtures";
import { hutPlanInput } from "./plan-fixtures";

// 1480 mm × 670 mm = 0.9916 m² a module.
const module: ModulePart = { ...TEST_MODULE, cellsInSeries: 36, areaM2: 0.9916 };

describe("array area against the site's limit", () => {
  it("passes at or under the limit and fails over it (6 × 0.9916 = 5.9496 m²)", () => {
    const under = arrayAreaCheck(module, 6, 6);
    expect(under?.status).toBe("pass");
    expect(under?.figures.find((f) => f.label === "Array area")?.value).toBeCloseTo(5.9496, 10);
    expect(under?.sentence).toBe("6 modules of 0.992 m² cover 5.95 m², within the 6.00 m² the site allows.");
    expect(arrayAreaCheck(module, 6, 5.9496)?.status).toBe("pass"); // exactly at the limit
    const over = arrayAreaCheck(module, 6, 5.9);
    expect(over?.status).toBe("fail");
    expect(over?.kind).toBe("performance");
    expect(over?.sentence).toMatch(/^6 modules of 0\.992 m² cover 5\.95 m², more than the 5\.90 m² the site allows\./);
  });

  it("is left out when the plan sets no limit", () => {
    expect(arrayAreaCheck(module, 6, undefined)).toBeNull();
  });

  it("says so, and does not fail, when the module's area is not known", () => {
    const unknown = arrayAreaCheck({ ...module, areaM2: null }, 6, 5);
    expect(unknown?.status).toBe("warn");
    expect(unknown?.sentence).toMatch(/The module's area is not known, so the 6 modules could not be checked against the 5\.00 m²/);
  });

  it("is one of the plan's checks when the design sets a limit", () => {
    const input = hutPlanInput({ maxArrayAreaM2: 3 });
    input.parts.module = { ...input.parts.module, areaM2: 0.67 }; // 1000 × 670 mm
    const plan = planKit(input);
    const check = plan.checks.find((c) => c.id === "array.area");
    const count = plan.array.layout.moduleCount;
    expect(count * 0.67).toBeGreaterThan(3); // the hut needs more than 4 of these 100 W modules
    expect(check?.status).toBe("fail");
    expect(check?.figures.find((f) => f.label === "Array area")?.value).toBeCloseTo(count * 0.67, 10);
    expect(planKit(hutPlanInput()).checks.some((c) => c.id === "array.area")).toBe(false);
  });
});
