// Text that cannot be stored: PostgreSQL text cannot hold NUL (U+0000), and an unpaired surrogate
// (U+D800–U+DFFF) is not Unicode text at all (RFC 7493, §2.1, forbids it in I-JSON). JSON can carry
// both as escapes ("\u0000", "\ud800"), so JSON read from a request or a hidden form field is checked
// string by string, keys included.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function textProblem(label: string, text: string): string | null {
  if (text.includes("\0")) return `${label} contains a NUL character (U+0000), which cannot be stored. Remove it and send again.`;
  if (LONE_SURROGATE.test(text)) return `${label} contains an unpaired surrogate (U+D800–U+DFFF), which is not valid Unicode text.`;
  return null;
}

/** The first unstorable string in a parsed JSON value, walked without recursion (it may be deep). */
export function jsonTextProblem(value: unknown, label = "A text in the JSON"): string | null {
  const stack: unknown[] = [value];
  while (stack.length) {
    const item = stack.pop();
    if (typeof item === "string") {
      const problem = textProblem(label, item);
      if (problem) return problem;
    } else if (Array.isArray(item)) {
      for (const inner of item) stack.push(inner);
    } else if (item && typeof item === "object") {
      for (const [key, inner] of Object.entries(item)) stack.push(key, inner);
    }
  }
  return null;
}
