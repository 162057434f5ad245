import { describe, expect, it } from "vitest";
import { DAYS_IN_MONTH, monthOfDay } from "~/domain/sizing/weather-year";
import { dayLabel, formatDate, formatFigure, formatNumber, layoutWords, monthStartDays } from "~/lib/plan-format";

describe("plan formatting", () => {
  it("writes negative numbers with a true minus sign and unknowns as a dash", () => {
    expect(formatNumber(-25.04, 1)).toBe("−25.0");
    expect(formatNumber(-0.004, 1)).toBe("0.0"); // no "−0.0"
    expect(formatNumber(12345.6, 0)).toBe("12,346");
    expect(formatNumber(null)).toBe("—");
    expect(formatNumber(Number.NaN)).toBe("—");
  });

  it("gives check figures a sensible precision and leaves whole numbers (seeds, counts) alone", () => {
    expect(formatFigure(20260101)).toBe("20260101");
    expect(formatFigure(101.66)).toBe("101.7"); // near a 100 V limit the tenth matters
    expect(formatFigure(1483.4)).toBe("1483");
    expect(formatFigure(22.13)).toBe("22.1");
    expect(formatFigure(5.4321)).toBe("5.43");
    expect(formatFigure(0.0967)).toBe("0.097");
    expect(formatFigure(-0.3)).toBe("−0.300");
  });

  it("names layouts in words", () => {
    expect(layoutWords(3, 2)).toBe("3 in series × 2 strings");
    expect(layoutWords(4, 1)).toBe("4 in series × 1 string");
  });

  it("finds the first day of every month in the simulated year and labels days by date", () => {
    const months = Array.from(monthOfDay());
    const starts = monthStartDays(months);
    expect(starts).toHaveLength(12);
    // Each start is the sum of the days in the months before it.
    starts.forEach((s, i) => expect(s.dayIndex).toBe(DAYS_IN_MONTH.slice(0, i).reduce((a, b) => a + b, 0)));
    expect(dayLabel(months, 0)).toBe("1 Jan");
    expect(dayLabel(months, 31)).toBe("1 Feb");
    expect(dayLabel(months, 364)).toBe("31 Dec");
  });

  it("prints dates the same everywhere (UTC)", () => {
    expect(formatDate("2026-12-01T23:30:00Z")).toBe("1 Dec 2026");
    expect(formatDate(new Date(Date.UTC(2026, 0, 9)))).toBe("9 Jan 2026");
  });
});
