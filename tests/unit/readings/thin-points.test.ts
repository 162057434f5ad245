// Drawing helpers for the sweep chart (our own rules, common practice, no source).
import { describe, expect, it } from "vitest";
import { niceTicks, thinPoints } from "~/lib/thin-points";

describe("chart helpers", () => {
  it("keeps both ends and evenly spaced points when thinning", () => {
    const points = Array.from({ length: 1001 }, (_, i) => i);
    const thin = thinPoints(points, 11);
    expect(thin).toEqual([0, 100, 200, 300, 400, 500, 600, 700, 800, 900, 1000]);
    expect(thinPoints([1, 2, 3], 10)).toEqual([1, 2, 3]);
  });

  it("makes round ticks that reach past the largest value", () => {
    expect(niceTicks(22.2)).toEqual([0, 5, 10, 15, 20, 25]);
    expect(niceTicks(7.96)).toEqual([0, 2, 4, 6, 8]);
    expect(niceTicks(136.2)).toEqual([0, 50, 100, 150]);
    expect(niceTicks(110)).toEqual([0, 25, 50, 75, 100, 125]);
    expect(niceTicks(0.42)).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5]);
    expect(niceTicks(0)).toEqual([0, 1]);
  });
});
