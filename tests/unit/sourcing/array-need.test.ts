// Modules and roof area for an energy target by the peak-sun-hours method (common practice, no
// source). Expected values worked by hand.
import { describe, expect, it } from "vitest";
import { arrayAreaM2, modulesNeeded, requiredArrayPowerW } from "~/domain/sourcing/array-need";

describe("array power for an energy target", () => {
  it("2400 Wh/day at 3 sun hours with 20 % losses needs 2400 ÷ (3 × 0.8) = 1000 W", () => {
    expect(requiredArrayPowerW(2400, 3, 20)).toBeCloseTo(1000, 9);
    // 500 Wh/day, 5 h, no losses → 100 W
    expect(requiredArrayPowerW(500, 5, 0)).toBeCloseTo(100, 9);
  });

  it("refuses impossible inputs", () => {
    expect(() => requiredArrayPowerW(0, 3, 20)).toThrow(RangeError);
    expect(() => requiredArrayPowerW(100, 0, 20)).toThrow(RangeError);
    expect(() => requiredArrayPowerW(100, 3, 100)).toThrow(RangeError);
  });
});

describe("modules needed", () => {
  const needW = requiredArrayPowerW(2400, 3, 20); // 1000 W (999.9999… in binary floating point)

  it("counts whole modules, an exact fit not rounded up by float error", () => {
    expect(modulesNeeded(needW, 125)).toBe(8); // 1000 ÷ 125 = 8
    expect(modulesNeeded(needW, 126)).toBe(8); // 7.94 → 8
    expect(modulesNeeded(needW, 118.8)).toBe(9); // 8.42 → 9
    expect(modulesNeeded(needW, 150)).toBe(7); // 6.67 → 7
    expect(modulesNeeded(10, 400)).toBe(1);
  });

  it("gives the outline area of those modules", () => {
    // 8 × (1.480 m × 0.670 m = 0.9916 m²) = 7.9328 m²
    expect(arrayAreaM2(8, 1.48 * 0.67)).toBeCloseTo(7.9328, 9);
  });
});
