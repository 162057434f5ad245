import { describe, expect, it } from "vitest";
import { parseMonthlyCsv, parseTwelveNumbers } from "~/components/sites/monthly-paste";

describe("monthly data brought in by the installer", () => {
  it("reads twelve pasted numbers in any common separator", () => {
    expect(parseTwelveNumbers("1.4 2.4 3.6\n4.6;5.3,5.9 6 5.1 3.9 2.6 1.6 1.2")).toEqual([1.4, 2.4, 3.6, 4.6, 5.3, 5.9, 6, 5.1, 3.9, 2.6, 1.6, 1.2]);
  });

  it("says how many values it found, and which one is not a number", () => {
    expect(parseTwelveNumbers("1 2 3")).toMatch(/Found 3 values/);
    expect(parseTwelveNumbers("1 2 3 4 5 six 7 8 9 10 11 12")).toMatch(/Value 6 \("six"\)/);
  });

  it("reads a CSV with a header and a month column", () => {
    const csv = ["month,ghi,tmax,tmin", ...Array.from({ length: 12 }, (_, i) => `${i + 1},${(1 + i / 10).toFixed(1)},${i},${i - 8}`)].join("\n");
    const rows = parseMonthlyCsv(csv);
    expect(Array.isArray(rows) && rows[11]).toEqual({ ghiKWhM2Day: "2.1", tMaxC: "11", tMinC: "3", albedo: undefined });
  });

  it("refuses a CSV without twelve data rows", () => {
    expect(parseMonthlyCsv("month,ghi\n1,2\n2,3")).toMatch(/needs 12/);
  });
});
