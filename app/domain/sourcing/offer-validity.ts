// An offer holds through its valid-until day (inclusive). Dates are ISO text (YYYY-MM-DD), so that
// comparing them is comparing strings and no time zone can move a day.

export function isoDate(date: Date): string {
  return date.toISOString().slice(0, 10);
}

/** Today's date in UTC: the day comparisons are made on unless a date is given. */
export function todayIso(now: Date = new Date()): string {
  return isoDate(now);
}

export function isExpired(validUntil: string | null, asOf: string): boolean {
  return validUntil !== null && validUntil < asOf;
}

/** A real calendar date written as YYYY-MM-DD (rejects 2026-02-30). */
export function isIsoDate(text: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(text)) return false;
  const date = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && isoDate(date) === text;
}
