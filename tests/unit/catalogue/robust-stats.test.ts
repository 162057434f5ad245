import { describe, expect, it } from "vitest";
import { median, robustZScore, scaledMad, weightedMedian } from "~/domain/catalogue/robust-stats";

describe("robust statistics", () => {
  it("median and MAD of a small sample, worked by hand", () => {
    // Values 2, 4, 4, 5, 7, 100: median (4 + 5) / 2 = 4.5; deviations 2.5, 0.5, 0.5, 0.5, 2.5, 95.5
    // → median 1.5; scaled by 1.4826 (Rousseeuw & Croux 1993) → 2.2239.
    const values = [7, 2, 100, 4, 5, 4];
    expect(median(values)).toBe(4.5);
    expect(scaledMad(values)).toBeCloseTo(2.2239, 4);
  });

  it("a far reading scores beyond the 3.5 outlier mark; a near one does not", () => {
    // Iglewicz & Hoaglin (1993) suggest |modified z| > 3.5 as an outlier.
    const approved = [86, 88, 87, 85, 89, 88];
    expect(Math.abs(robustZScore(60, approved)!)).toBeGreaterThan(3.5);
    expect(Math.abs(robustZScore(87.5, approved)!)).toBeLessThan(1);
  });

  it("gives no score from fewer than three readings or from identical ones", () => {
    expect(robustZScore(50, [80, 90])).toBeNull();
    expect(robustZScore(50, [80, 80, 80])).toBeNull();
  });

  it("weighted median follows the weight, and equals the median with equal weights", () => {
    expect(weightedMedian([80, 90, 100], [1, 1, 1])).toBe(90);
    expect(weightedMedian([80, 90, 100, 110], [1, 1, 1, 1])).toBe(95);
    // Estimated-irradiance readings count half: the measured ones (100, 110) carry the median.
    expect(weightedMedian([80, 85, 100, 110], [0.5, 0.5, 1, 1])).toBe(100);
  });
});
