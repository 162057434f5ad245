// Calendar dates as ISO text (YYYY-MM-DD), computed in UTC so the server's zone never shifts a day.

export function addDaysIso(iso: string, days: number): string {
  const d = new Date(`${iso}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}
