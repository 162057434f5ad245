// A name or title typed by a person: trimmed, within length, and with at least one letter or digit,
// so that a name of spaces, zero-width characters or punctuation alone cannot be saved.
import { z } from "zod";

export function hasLetterOrDigit(text: string) {
  return /[\p{L}\p{N}]/u.test(text);
}

export function nameField(missing: string, { min = 2, max = 120, tooLong }: { min?: number; max?: number; tooLong?: string } = {}) {
  return z
    .string({ error: missing })
    .trim()
    .min(min, min === 1 ? missing : `Use at least ${min} characters.`)
    .max(max, tooLong)
    .refine(hasLetterOrDigit, "Use at least one letter or digit.");
}
