// Words for field readings, shared by pages, e-mails and the API's consumers.
export const IRRADIANCE_SOURCE_LABEL = {
  pyranometer: "measured with a pyranometer",
  "reference-cell": "measured with a reference cell",
  "clear-sky-estimate": "estimated from a clear-sky model — weighted lower",
} as const;

export const CELL_TEMPERATURE_SOURCE_LABEL = {
  "back-sheet": "from the back-sheet reading",
  "air-noct": "estimated from air temperature (NOCT model)",
} as const;

export const STATUS_LABEL = {
  pending: "Pending review",
  approved: "Approved",
  rejected: "Rejected",
} as const;

export function pct(value: number, digits = 0) {
  return `${(100 * value).toFixed(digits)} %`;
}

export function watts(value: number | null | undefined, digits = 1) {
  return value === null || value === undefined ? "—" : `${value.toFixed(digits)} W`;
}
