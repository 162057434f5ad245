// Reading a load sweep from CSV. The accepted layouts are our own rules (common practice, no
// source): the checks are that every layout we promise on the form reads the same points, and
// that every bad file is refused with the line number of the bad row.
import { describe, expect, it } from "vitest";
import { parseSweepCsv, readHeader, SWEEP_CSV_MAX_BYTES, SWEEP_MAX_POINTS } from "~/domain/readings/sweep-csv";

const POINTS = [
  { voltageV: 0, currentA: 5.9 },
  { voltageV: 10.5, currentA: 5.8 },
  { voltageV: 18.2, currentA: 5.5 },
  { voltageV: 22.1, currentA: 0 },
];

function ok(text: string) {
  const result = parseSweepCsv(text);
  if (!result.ok) throw new Error(result.message);
  return result;
}

function fails(text: string) {
  const result = parseSweepCsv(text);
  if (result.ok) throw new Error("expected the file to be refused");
  return result.message;
}

describe("readHeader", () => {
  it.each([
    ["voltage", "voltage", null],
    ["Voltage (V)", "voltage", "v"],
    ["voltage_mV", "voltage", "mv"],
    ["V", "voltage", null],
    ["current [A]", "current", "a"],
    ["I_mA", "current", "ma"],
    ["time (s)", "time", "s"],
    ["t_ms", "time", "ms"],
  ])("reads %s as %s in %s", (header, quantity, unit) => {
    expect(readHeader(header)).toEqual({ quantity, unit });
  });

  it("does not recognise other columns", () => {
    expect(readHeader("temperature")).toBeNull();
    expect(readHeader("power (W)")).toBeNull();
  });
});

describe("parseSweepCsv", () => {
  it("reads a comma-separated file with a plain header", () => {
    const result = ok(["voltage,current", ...POINTS.map((p) => `${p.voltageV},${p.currentA}`)].join("\n"));
    expect(result.points).toEqual(POINTS);
    expect(result.durationS).toBeNull();
    expect(result.units).toEqual({ voltage: "V", current: "A" });
  });

  it("converts millivolts and milliamperes named in the header", () => {
    const result = ok(["voltage (mV);current (mA)", ...POINTS.map((p) => `${p.voltageV * 1000};${p.currentA * 1000}`)].join("\r\n"));
    result.points.forEach((p, i) => {
      expect(p.voltageV).toBeCloseTo(POINTS[i].voltageV, 9);
      expect(p.currentA).toBeCloseTo(POINTS[i].currentA, 9);
    });
    expect(result.units).toEqual({ voltage: "mV", current: "mA" });
  });

  it("accepts columns in any order, extra columns, blank lines, a byte-order mark and a decimal comma with semicolons", () => {
    const text = "\uFEFFtime (ms);temperature;current (A);voltage (V)\n0;31,5;5,9;0\n\n400;31,5;5,8;10,5\n800;31,6;5,5;18,2\n1200;31,6;0;22,1\n";
    const result = ok(text);
    expect(result.points).toEqual(POINTS);
    expect(result.durationS).toBeCloseTo(1.2, 9);
  });

  it("reads a file without a header as volts then amperes", () => {
    expect(ok(POINTS.map((p) => `${p.voltageV},${p.currentA}`).join("\n")).points).toEqual(POINTS);
  });

  it("names every row that is not a number, by its line in the file", () => {
    const message = fails("voltage,current\n0,5.9\n10.5,abc\n\n18.2,5.5\nx,0\n");
    expect(message).toContain('Row 3: current "abc" is not a number.');
    expect(message).toContain('Row 6: voltage "x" is not a number.');
  });

  it("lists at most five bad rows and counts the rest", () => {
    const rows = Array.from({ length: 8 }, (_, i) => `${i},oops`);
    const message = fails(["voltage,current", ...rows].join("\n"));
    expect(message).toContain("Row 6:");
    expect(message).not.toContain("Row 7:");
    expect(message).toContain("…and 3 more rows.");
  });

  it("refuses a row with a missing current", () => {
    expect(fails("voltage,current\n0,5.9\n10.5\n")).toContain("Row 3: current");
  });

  it("refuses a header without voltage and current, and a unit it cannot convert", () => {
    expect(fails("volts,temperature\n1,2\n")).toMatch(/voltage column and a current column/);
    expect(fails("voltage (kV),current (A)\n0.01,5\n")).toMatch(/"voltage \(kV\)" is in kv; give voltage in V or mV/);
  });

  it("refuses an empty file, a header alone and text that is not CSV", () => {
    expect(fails("")).toBe("The file is empty.");
    expect(fails("voltage,current\n")).toMatch(/no data rows/);
    expect(fails("This is a letter, not a sweep.\nRegards")).toMatch(/voltage column/);
  });

  it(`refuses more than ${SWEEP_MAX_POINTS} points and files over ${SWEEP_CSV_MAX_BYTES / 1024} KB`, () => {
    const many = ["v,i", ...Array.from({ length: SWEEP_MAX_POINTS + 1 }, (_, i) => `${i / 100},1`)].join("\n");
    expect(fails(many)).toMatch(/2001 data rows; a sweep may have at most 2000/);
    const big = "v,i\n" + "1,1\n".repeat(SWEEP_CSV_MAX_BYTES / 4 + 10);
    expect(fails(big)).toMatch(/larger than 200 KB/);
  });
});
