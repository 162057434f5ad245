// Turns Stripe's form encoding (`line_items[0][price_data][unit_amount]=500`,
// `metadata[quoteId]=x`, `expand[]=line_items`) back into nested objects and arrays.
export type Params = { [key: string]: ParamValue };
export type ParamValue = string | Params | ParamValue[];

export class ParamsError extends Error {}

// Keys that would reach Object.prototype through bracket assignment.
const FORBIDDEN = new Set(["__proto__", "prototype", "constructor"]);

export function parseStripeForm(body: string | URLSearchParams): Params {
  const search = typeof body === "string" ? new URLSearchParams(body) : body;
  // Build with index-keyed objects first, then turn numeric-keyed ones into arrays, so that
  // `a[1]` arriving before `a[0]` (or a gap) still yields a dense array in index order.
  const root: Record<string, unknown> = {};
  for (const [key, value] of search) setPath(root, splitKey(key), value);
  return toParams(root) as Params;
}

function splitKey(key: string): string[] {
  const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
  if (!match) throw new ParamsError(`Invalid parameter name: ${key}`);
  const rest = [...match[2]!.matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]!);
  const parts = [match[1]!, ...rest];
  if (parts.some((p) => FORBIDDEN.has(p))) throw new ParamsError(`Invalid parameter name: ${key}`);
  return parts;
}

function setPath(root: Record<string, unknown>, parts: string[], value: string): void {
  let node: Record<string, unknown> = root;
  for (let i = 0; i < parts.length; i++) {
    // `[]` appends: give it the next free index.
    const part = parts[i] === "" ? String(nextIndex(node)) : parts[i]!;
    const last = i === parts.length - 1;
    if (last) {
      if (isContainer(node[part])) throw conflict(parts);
      node[part] = value;
      return;
    }
    const child = node[part];
    if (child === undefined) node[part] = {};
    else if (!isContainer(child)) throw conflict(parts);
    node = node[part] as Record<string, unknown>;
  }
}

function nextIndex(node: Record<string, unknown>): number {
  const indexes = Object.keys(node).filter(isIndex).map(Number);
  return indexes.length === 0 ? 0 : Math.max(...indexes) + 1;
}

function toParams(value: unknown): ParamValue {
  if (typeof value === "string") return value;
  const node = value as Record<string, unknown>;
  const keys = Object.keys(node);
  if (keys.length > 0 && keys.every(isIndex)) {
    return keys
      .map(Number)
      .sort((a, b) => a - b)
      .map((k) => toParams(node[String(k)]));
  }
  const out: Params = {};
  for (const key of keys) out[key] = toParams(node[key]);
  return out;
}

function isIndex(key: string): boolean {
  return /^(0|[1-9]\d{0,5})$/.test(key);
}

function isContainer(value: unknown): boolean {
  return typeof value === "object" && value !== null;
}

function conflict(parts: string[]): ParamsError {
  return new ParamsError(`Conflicting values for parameter ${parts[0]}`);
}

/** Reads JSON bodies too, so the test hooks can be driven with either encoding. */
export function parseBody(body: string, contentType: string | undefined): Params {
  if (!body.trim()) return {};
  if (contentType?.includes("application/json")) {
    let parsed: unknown;
    try {
      parsed = JSON.parse(body);
    } catch {
      throw new ParamsError("Invalid JSON body");
    }
    if (!isContainer(parsed) || Array.isArray(parsed)) throw new ParamsError("Expected a JSON object");
    return parsed as Params;
  }
  return parseStripeForm(body);
}
