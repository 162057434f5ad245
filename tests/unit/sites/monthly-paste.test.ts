import { describe, expect, it } from "vitest";
import { parseMonthlyCsv, parseTwelveNumbers } from "~/lib/monthly-data";

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

  // The Vell hut's months as invented demo data: irradiation, mean max, mean min.
  const GHI = ["1.4", "2.4", "3.6", "4.6", "5.3", "5.9", "6", "5.1", "3.9", "2.6", "1.6", "1.2"];
  const row = (i: number) => [GHI[i], String(i - 4), String(i - 12)];

  it("puts each row in its month when the file starts in July", () => {
    const order = [6, 7, 8, 9, 10, 11, 0, 1, 2, 3, 4, 5];
    const csv = ["month,ghi,tmax,tmin", ...order.map((i) => [i + 1, ...row(i)].join(","))].join("\n");
    const rows = parseMonthlyCsv(csv);
    expect(Array.isArray(rows)).toBe(true);
    expect((rows as { ghiKWhM2Day?: string }[]).map((r) => r.ghiKWhM2Day)).toEqual(GHI);
    expect((rows as object[])[0]).toEqual({ ghiKWhM2Day: "1.4", tMaxC: "-4", tMinC: "-12" });
    // The same without a header: a first column holding 1 to 12 once each is the month.
    const bare = order.map((i) => [i + 1, ...row(i)].join(",")).join("\n");
    expect((parseMonthlyCsv(bare) as { tMinC?: string }[]).map((r) => r.tMinC)).toEqual(GHI.map((_, i) => String(i - 12)));
  });

  it("orders month names too, July first, with no header", () => {
    const names = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];
    const order = [6, 7, 8, 9, 10, 11, 0, 1, 2, 3, 4, 5];
    const rows = parseMonthlyCsv(order.map((i) => [names[i], ...row(i)].join(";")).join("\n"));
    expect((rows as { ghiKWhM2Day?: string }[]).map((r) => r.ghiKWhM2Day)).toEqual(GHI);
  });

  it("reads a 4-column file with whole-number irradiation and no month column without shifting a row", () => {
    // ghi, tmax, tmin, albedo: whole numbers 1–6 in the first column are irradiation, not months.
    const ghi = [1, 2, 3, 4, 5, 6, 6, 5, 4, 3, 2, 1];
    const csv = ghi.map((g, i) => `${g},${i + 1},${i - 8},0.7`).join("\n");
    const rows = parseMonthlyCsv(csv);
    expect(Array.isArray(rows)).toBe(true);
    expect((rows as object[])[1]).toEqual({ ghiKWhM2Day: "2", tMaxC: "2", tMinC: "-7", albedo: "0.7" });
    expect((rows as { albedo?: string }[]).every((r) => r.albedo === "0.7")).toBe(true);
    expect((rows as { ghiKWhM2Day?: string }[]).map((r) => r.ghiKWhM2Day)).toEqual(ghi.map(String));
  });

  it("refuses a month given twice, naming the month and both lines", () => {
    const months = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 3];
    const csv = ["month,ghi,tmax,tmin", ...months.map((m, i) => [m, ...row(i)].join(","))].join("\n");
    expect(parseMonthlyCsv(csv)).toBe("March appears twice (lines 4 and 13).");
  });

  it("refuses a missing month, naming it", () => {
    const months = [1, 2, 3, 5, 6, 7, 8, 9, 10, 11, 12];
    const csv = ["Month,GHI,Tmax,Tmin", ...months.map((m, i) => [m, ...row(i)].join(","))].join("\n");
    expect(parseMonthlyCsv(csv)).toMatch(/^No row for April: the file needs 12 rows/);
  });

  it("refuses a month the calendar does not have", () => {
    const csv = ["month,ghi,tmax,tmin", ...GHI.map((_, i) => [i === 4 ? 13 : i + 1, ...row(i)].join(","))].join("\n");
    expect(parseMonthlyCsv(csv)).toBe('Line 6: "13" is not a month (1–12 or a month\'s name).');
  });

  it("reads header variants by name: units in the names, columns in another order, a month column last", () => {
    const csv = [
      "Tmin (°C);Tmax (°C);Irradiation (kWh/m²/day);Albedo;Month",
      ...GHI.map((g, i) => [String(i - 12), String(i - 4), g.replace(".", ","), "0,3", String(12 - i)].join(";")),
    ].join("\n");
    const rows = parseMonthlyCsv(csv) as { ghiKWhM2Day?: string; tMaxC?: string; albedo?: string }[];
    expect(Array.isArray(rows)).toBe(true);
    // The file lists December first; January (its last line) holds GHI[11] and tmax 7.
    expect(rows[0]).toEqual({ tMinC: "-1", tMaxC: "7", ghiKWhM2Day: "1.2", albedo: "0.3" });
    expect(rows[11].ghiKWhM2Day).toBe("1.4");
  });

  it("reads a header without a month column as January first, and a header it cannot name by position", () => {
    const named = ["ghi,tmax,tmin", ...GHI.map((_, i) => row(i).join(","))].join("\n");
    expect((parseMonthlyCsv(named) as object[])[2]).toEqual({ ghiKWhM2Day: "3.6", tMaxC: "-2", tMinC: "-10" });
    const unnamed = ["a,b,c", ...GHI.map((_, i) => row(i).join(","))].join("\n");
    expect((parseMonthlyCsv(unnamed) as object[])[2]).toEqual({ ghiKWhM2Day: "3.6", tMaxC: "-2", tMinC: "-10" });
  });

  it("refuses a value where the layout has no column, and a word where a number belongs", () => {
    const extra = ["ghi,tmax,tmin", ...GHI.map((_, i) => [...row(i), i === 3 ? "9" : ""].join(","))].join("\n");
    expect(parseMonthlyCsv(extra)).toBe('Line 5 has a value ("9") in a column the file\'s layout has no place for.');
    const word = ["month,ghi,tmax,tmin", ...GHI.map((_, i) => [i + 1, i === 2 ? "sunny" : GHI[i], i, i - 8].join(","))].join("\n");
    expect(parseMonthlyCsv(word)).toBe('Line 4: the irradiation ("sunny") is not a number.');
  });

  it("refuses a file where only some rows start with a month name", () => {
    const csv = GHI.map((_, i) => [i < 6 ? "Jan Feb Mar Apr May Jun".split(" ")[i] : "", ...row(i)].join(",")).join("\n");
    expect(parseMonthlyCsv(csv)).toMatch(/Some rows start with a month name/);
  });
});
