// The time of a reading as the installer gives it (local wall-clock time and the UTC offset of the
// place) and back. The sun's position needs the UTC instant; people read the local time.

const LOCAL_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/;

/** "2026-06-14T12:30" at UTC+1 → 2026-06-14T11:30Z. Null when the text is not a valid local time. */
export function localTimeToUtc(localTime: string, utcOffsetH: number): Date | null {
  const match = LOCAL_TIME.exec(localTime.trim());
  if (!match || !Number.isFinite(utcOffsetH)) return null;
  const [year, month, day, hour, minute, second] = match.slice(1).map((part) => Number(part ?? 0));
  const asUtcMs = Date.UTC(year, month - 1, day, hour, minute, second);
  const check = new Date(asUtcMs);
  // Date.UTC rolls 31 April over to 1 May: refuse dates that do not exist.
  if (check.getUTCMonth() !== month - 1 || check.getUTCDate() !== day || hour > 23 || minute > 59 || second > 59) return null;
  return new Date(asUtcMs - Math.round(utcOffsetH * 60) * 60_000);
}

export function formatUtcOffset(offsetMin: number): string {
  const sign = offsetMin < 0 ? "−" : "+";
  const abs = Math.abs(offsetMin);
  return `UTC${sign}${String(Math.floor(abs / 60)).padStart(2, "0")}:${String(abs % 60).padStart(2, "0")}`;
}

/** "2026-06-14 12:30 (UTC+01:00)" — the wall-clock time where the reading was taken. */
export function formatReadingTime(instantUtc: Date, offsetMin: number | null): string {
  const offset = offsetMin ?? 0;
  const local = new Date(instantUtc.getTime() + offset * 60_000).toISOString();
  return `${local.slice(0, 10)} ${local.slice(11, 16)} (${formatUtcOffset(offset)})`;
}
