// Collects one plain-words message per field, so forms and CSV rows can show it beside the field.
// A field keeps its first message: a range error is more useful than a cross-check built on it.
export type FieldIssues<T> = Partial<Record<Extract<keyof T, string>, string>>;

/** A number for a message: at most 3 decimals, no trailing zeros ("0.3", "415", "12.25"). */
export function fmt(value: number, decimals = 3) {
  return String(Number(value.toFixed(decimals)));
}

export function issueCollector<T>() {
  const issues: FieldIssues<T> = {};
  type Field = Extract<keyof T, string>;
  return {
    issues,
    add(field: Field, message: string) {
      if (!issues[field]) issues[field] = message;
    },
    /** True when none of the fields has a message yet (cross-checks need clean inputs). */
    clean(...fields: Field[]) {
      return fields.every((f) => !issues[f]);
    },
    range(field: Field, value: number | null | undefined, min: number, max: number, label: string, unit = "") {
      if (value === null || value === undefined) return;
      const suffix = unit ? ` ${unit}` : "";
      if (!Number.isFinite(value)) this.add(field, `${label} must be a number.`);
      else if (value < min || value > max) this.add(field, `${label} must be between ${fmt(min)} and ${fmt(max)}${suffix}.`);
    },
    integer(field: Field, value: number, label: string) {
      if (Number.isFinite(value) && !Number.isInteger(value)) this.add(field, `${label} must be a whole number.`);
    },
  };
}
