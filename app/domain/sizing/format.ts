// Number formatting for the plain sentences of the checks (the figures keep full precision).

export const MONTH_NAMES = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** Fixed decimals with a true minus sign (−20, not -20) for the sentences. */
export function fmt(value: number, digits = 1): string {
  const text = value.toFixed(digits);
  return text.startsWith("-") ? `−${text.slice(1)}` : text;
}
