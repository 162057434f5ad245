// A generated corpus of malformed requests for every form action and API route (app/routes.ts).
// Each family module builds its cases from a valid base (the ids the test seeded) by breaking one
// thing at a time; buildHostileCorpus puts them together. The test sends each one to the production
// server and checks the answer and the database.
import { urlEncoded, multipart, type FilePart, type FormFields } from "./hostile-http";
import { BAD_NUMBERS } from "./hostile-values";

export type Actor = "installer" | "loner" | "curator" | "admin" | "customer" | "anonymous" | "apiKey";

export interface HostileCase {
  family: string;
  label: string;
  actor: Actor;
  method: "GET" | "POST";
  path: string;
  body?: Buffer;
  contentType?: string;
  chunked?: boolean;
  headers?: Record<string, string>;
  /** The Origin header of a POST: the app's own unless set; null sends none. */
  origin?: string | null;
  /** Statuses allowed: a list, or "4xx" (the default for writes), or "not5xx" (page loaders given odd queries). */
  expect?: number[] | "4xx" | "not5xx";
  /** What the answer must say (the reason a person or a client is given). */
  expectText?: RegExp;
  /** Append-only tables this case may add rows to; each use says why where the case is made. */
  mayWrite?: string[];
}

export interface SeededIds {
  moduleId: string;
  mergeDuplicateId: string;
  batteryId: string;
  controllerId: string;
  inverterId: string;
  siteId: string;
  loadSheetId: string;
  planId: string;
  otherTeamSiteId: string;
  supplierId: string;
  offerId: string;
  readingId: string;
  fileId: string;
  sentQuoteId: string;
  draftQuoteId: string;
  quoteAccessToken: string;
  memberId: string;
  adminUserId: string;
  otherUserId: string;
}

/** A uuid nothing in the database has. */
export const UNKNOWN_ID = "00000000-0000-4000-8000-000000000000";
/** Path segments that are not ids: not a uuid, SQL, traversal, a NUL, an over-long one. */
export const BAD_IDS = ["not-a-uuid", "1%27%20OR%20%271%27%3D%271", "..%2F..%2Fetc%2Fpasswd", "abc%00def", "9".repeat(300), UNKNOWN_ID] as const;

type Extra = Partial<Omit<HostileCase, "family" | "label" | "actor" | "method" | "path">>;

export function postForm(family: string, actor: Actor, path: string, label: string, fields: FormFields, extra: Extra = {}): HostileCase {
  return { family, label, actor, method: "POST", path, body: urlEncoded(fields), contentType: "application/x-www-form-urlencoded", ...extra };
}

export function postMultipart(
  family: string,
  actor: Actor,
  path: string,
  label: string,
  fields: FormFields,
  files: FilePart[],
  extra: Extra = {},
): HostileCase {
  const { body, contentType } = multipart(fields, files);
  return { family, label, actor, method: "POST", path, body, contentType, ...extra };
}

export function postJson(family: string, actor: Actor, path: string, label: string, json: string | Buffer, extra: Extra = {}): HostileCase {
  return {
    family,
    label,
    actor,
    method: "POST",
    path,
    body: typeof json === "string" ? Buffer.from(json, "utf8") : json,
    contentType: "application/json",
    ...extra,
  };
}

export function get(family: string, actor: Actor, path: string, label: string, extra: Extra = {}): HostileCase {
  return { family, label, actor, method: "GET", path, ...extra };
}

/** The fields with `name` set to `value` (replaced where present, appended otherwise). */
export function withField(fields: FormFields, name: string, value: string | Buffer): FormFields {
  return fields.some(([k]) => k === name) ? fields.map(([k, v]) => [k, k === name ? value : v]) : [...fields, [name, value]];
}

export function without(fields: FormFields, ...names: string[]): FormFields {
  return fields.filter(([k]) => !names.includes(k));
}

/** Object → form fields with Conform's names (a.b, list[0].c). */
export function toFields(value: unknown, prefix = ""): FormFields {
  if (value === undefined || value === null) return [];
  if (Array.isArray(value)) return value.flatMap((item, i) => toFields(item, `${prefix}[${i}]`));
  if (typeof value === "object") return Object.entries(value).flatMap(([k, v]) => toFields(v, prefix ? `${prefix}.${k}` : k));
  return [[prefix, String(value)]];
}

/**
 * One case per (field, bad number): every bad number is used at least once and every field gets
 * at least one, rotating so that a long field list does not multiply the corpus.
 */
export function badNumberCases(make: (label: string, fields: FormFields) => HostileCase, base: FormFields, names: string[], perField = 1) {
  const total = Math.max(names.length * perField, BAD_NUMBERS.length);
  return Array.from({ length: total }, (_, k) => {
    const name = names[k % names.length];
    const value = BAD_NUMBERS[k % BAD_NUMBERS.length];
    return make(`${name} = ${JSON.stringify(value.length > 20 ? `${value.slice(0, 12)}…(${value.length})` : value)}`, withField(base, name, value));
  });
}

/** Every uuid-like path segment replaced by each bad id. */
export function badIdPaths(template: (id: string) => string) {
  return BAD_IDS.map((id) => ({ id, path: template(id) }));
}
