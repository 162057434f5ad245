// Money typed by a person or read from a CSV cell stays text until decimal.js parses it: this says
// what is wrong with such text, in words a person can act on. Nothing here makes a JavaScript number.

export interface DecimalRules {
  /** Digits allowed after the decimal point (prices per unit may need fractions of a cent). */
  maxDecimals: number;
  /** Refuse zero (an exchange rate must be above 0; a price may be 0 for a free item). */
  positive?: boolean;
}

const MAX_WHOLE_DIGITS = 12;

/** The problem with `text` as a non-negative decimal amount, or null when it is fine. */
export function decimalProblem(text: string, label: string, rules: DecimalRules): string | null {
  const value = text.trim();
  if (value === "") return `Enter the ${label}.`;
  if (/^\d+,\d+$/.test(value)) return `Use a decimal point in the ${label}: ${value.replace(",", ".")}, not ${value}.`;
  if (/^-/.test(value)) return `The ${label} cannot be negative.`;
  if (/[^\d.]/.test(value.replace(/^\+/, ""))) return `The ${label} must be a plain number such as 12.50 (no currency signs, spaces or thousands separators).`;
  const match = /^\+?(\d+)(?:\.(\d+))?$/.exec(value);
  if (!match) return `The ${label} must be a plain number such as 12.50.`;
  if (match[1].replace(/^0+(?=\d)/, "").length > MAX_WHOLE_DIGITS) return `The ${label} is too large.`;
  if ((match[2]?.length ?? 0) > rules.maxDecimals) return `The ${label} can have at most ${rules.maxDecimals} digits after the point.`;
  if (rules.positive && /^\+?0*(\.0*)?$/.test(value)) return `The ${label} must be above 0.`;
  return null;
}

/** The canonical text stored for a valid amount: no sign, no leading zeros ("012.50" → "12.50"). */
export function canonicalDecimal(text: string): string {
  const value = text.trim().replace(/^\+/, "");
  const [whole, fraction] = value.split(".");
  const trimmedWhole = whole.replace(/^0+(?=\d)/, "");
  return fraction === undefined ? trimmedWhole : `${trimmedWhole}.${fraction}`;
}
