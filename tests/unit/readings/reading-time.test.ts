// Local wall-clock time and UTC offset → UTC instant (calendar arithmetic; no source needed beyond
// the definition of a UTC offset, ISO 8601).
import { describe, expect, it } from "vitest";
import { formatReadingTime, formatUtcOffset, localTimeToUtc } from "~/domain/readings/reading-time";

describe("reading time", () => {
  it("subtracts the UTC offset", () => {
    expect(localTimeToUtc("2026-06-14T12:30", 1)?.toISOString()).toBe("2026-06-14T11:30:00.000Z");
    expect(localTimeToUtc("2026-06-14T12:30:15", -5.5)?.toISOString()).toBe("2026-06-14T18:00:15.000Z");
    expect(localTimeToUtc("2026-01-01T00:30", 2)?.toISOString()).toBe("2025-12-31T22:30:00.000Z");
  });

  it("refuses dates that do not exist and text that is not a time", () => {
    expect(localTimeToUtc("2026-04-31T10:00", 0)).toBeNull();
    expect(localTimeToUtc("2026-02-29T10:00", 0)).toBeNull();
    expect(localTimeToUtc("2028-02-29T10:00", 0)).not.toBeNull();
    expect(localTimeToUtc("2026-06-14T24:10", 0)).toBeNull();
    expect(localTimeToUtc("yesterday noon", 0)).toBeNull();
  });

  it("shows the time as read at the place", () => {
    expect(formatUtcOffset(60)).toBe("UTC+01:00");
    expect(formatUtcOffset(-330)).toBe("UTC−05:30");
    expect(formatReadingTime(new Date("2026-06-14T11:30:00Z"), 60)).toBe("2026-06-14 12:30 (UTC+01:00)");
    expect(formatReadingTime(new Date("2026-06-14T11:30:00Z"), null)).toBe("2026-06-14 11:30 (UTC+00:00)");
  });
});
