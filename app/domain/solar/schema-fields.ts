// Number and object fields with plain-words Zod messages ("Tilt must be at most 90°.").
import { z } from "zod";

export function numberIn(label: string, min: number, max: number, unit = "") {
  return z
    .number({ error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be a number.`) })
    .min(min, { error: `${label} must be at least ${min}${unit}.` })
    .max(max, { error: `${label} must be at most ${max}${unit}.` });
}

export function objectError(label: string) {
  return {
    error: (issue: { input?: unknown }) => (issue.input === undefined ? `${label} is required.` : `${label} must be an object.`),
  };
}

export function positiveBelow(label: string, max: number, unit: string) {
  return z
    .number({ error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be a number.`) })
    .gt(0, { error: `${label} must be more than 0${unit}.` })
    .max(max, { error: `${label} must be at most ${max}${unit}.` });
}
