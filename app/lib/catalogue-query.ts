// The catalogue list's query (search, filters, sort, paging) from URL search parameters. The same
// parser serves GET /api/v1/modules (bad values → 400 with the parameter's name) and the catalogue
// page (bad values are dropped and said so), so both return the same rows for the same address.
import { z } from "zod";
import { BATTERY_CHEMISTRIES, CELL_TECHNOLOGIES, CONTROLLER_KINDS, INVERTER_DC_VOLTAGES, type PartKind } from "~/domain/catalogue/part-kinds";

export const MODULE_SORT_KEYS = [
  "maker",
  "pmaxW",
  "vmpV",
  "vocV",
  "iscA",
  "cellsInSeries",
  "gammaPmaxPctPerC",
  "noctC",
  "areaM2",
  "massKg",
  "nameplateDensityWm2",
  "nameplateEfficiencyPct",
  "measuredDensityWm2",
  "verifiedPmaxW",
  "verifiedRatio",
  "readingCount",
  "spreadPct",
] as const;
export type ModuleSortKey = (typeof MODULE_SORT_KEYS)[number];

export const PART_SORT_KEYS = {
  modules: MODULE_SORT_KEYS,
  batteries: ["maker", "nominalVoltageV", "capacityAh", "energyKWh", "usableEnergyKWh", "usableDodPct", "cycleLife", "roundTripEfficiencyPct", "massKg"],
  controllers: ["maker", "maxPvVocV", "maxChargeCurrentA", "efficiencyPct"],
  inverters: ["maker", "continuousW", "surgeW", "dcInputVoltageV", "efficiencyPct", "idleDrawW"],
} as const satisfies Record<PartKind, readonly string[]>;

export const MAX_PAGE_SIZE = 200;
export const DEFAULT_PAGE_SIZE = 50;

function numberParam(name: string, min: number, max: number, integer = false) {
  return z
    .string()
    .optional()
    .transform((raw, ctx) => {
      if (raw === undefined || raw.trim() === "") return undefined;
      const value = Number(raw);
      if (!Number.isFinite(value) || (integer && !Number.isInteger(value)) || value < min || value > max) {
        ctx.addIssue({ code: "custom", message: `${name} must be a ${integer ? "whole number" : "number"} from ${min} to ${max}.` });
        return z.NEVER;
      }
      return value;
    });
}

function enumParam<const T extends readonly string[]>(name: string, values: T) {
  return z
    .string()
    .optional()
    .transform((raw, ctx) => {
      if (raw === undefined || raw === "") return undefined;
      if (!values.includes(raw)) {
        ctx.addIssue({ code: "custom", message: `${name} must be one of: ${values.join(", ")}.` });
        return z.NEVER;
      }
      return raw as T[number];
    });
}

const common = {
  q: z
    .string()
    .optional()
    .transform((q) => (q ?? "").trim().slice(0, 100)),
  dir: enumParam("dir", ["asc", "desc"] as const),
  limit: numberParam("limit", 1, MAX_PAGE_SIZE, true),
  offset: numberParam("offset", 0, 1_000_000, true),
};

const kindFilters = {
  modules: {
    technology: enumParam("technology", CELL_TECHNOLOGIES),
    minW: numberParam("minW", 0, 2000),
    maxW: numberParam("maxW", 0, 2000),
    hasReadings: enumParam("hasReadings", ["true", "false"] as const),
    ratioBelow: numberParam("ratioBelow", 0, 5),
  },
  batteries: { chemistry: enumParam("chemistry", BATTERY_CHEMISTRIES) },
  controllers: { type: enumParam("type", CONTROLLER_KINDS) },
  inverters: { dcV: enumParam("dcV", INVERTER_DC_VOLTAGES.map(String) as string[]) },
};

function buildSchema<K extends PartKind>(kind: K) {
  return z.object({ ...common, sort: enumParam("sort", PART_SORT_KEYS[kind]), ...kindFilters[kind] });
}

// Built once per kind: constructing a zod schema costs far more than parsing with it.
const SCHEMAS: { [K in PartKind]: ReturnType<typeof buildSchema<K>> } = {
  modules: buildSchema("modules"),
  batteries: buildSchema("batteries"),
  controllers: buildSchema("controllers"),
  inverters: buildSchema("inverters"),
};

function querySchema<K extends PartKind>(kind: K) {
  return SCHEMAS[kind];
}

export type ModuleFilters = {
  technology?: (typeof CELL_TECHNOLOGIES)[number];
  minW?: number;
  maxW?: number;
  hasReadings?: boolean;
  ratioBelow?: number;
};

export interface PartListQuery<K extends PartKind = PartKind> {
  kind: K;
  q: string;
  sort: (typeof PART_SORT_KEYS)[K][number];
  dir: "asc" | "desc";
  limit: number;
  offset: number;
  modules: ModuleFilters;
  chemistry?: (typeof BATTERY_CHEMISTRIES)[number];
  controllerType?: (typeof CONTROLLER_KINDS)[number];
  dcV?: number;
}

export type QueryOutcome<K extends PartKind> =
  { ok: true; query: PartListQuery<K> } | { ok: false; fields: Record<string, string>; fallback: PartListQuery<K> };

/** Parses search parameters; on failure gives the fields in error and a query with those dropped. */
export function parsePartQuery<K extends PartKind>(kind: K, params: URLSearchParams): QueryOutcome<K> {
  const raw = Object.fromEntries(params);
  const parsed = querySchema(kind).safeParse(raw);
  if (parsed.success) {
    const fields = crossCheck(parsed.data as { minW?: number; maxW?: number });
    const query = toQuery(kind, parsed.data);
    return Object.keys(fields).length ? { ok: false, fields, fallback: { ...query, modules: {} } } : { ok: true, query };
  }
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[String(issue.path[0] ?? "query")] ??= issue.message;
  const cleaned = Object.fromEntries(Object.entries(raw).filter(([key]) => !(key in fields)));
  const retry = querySchema(kind).safeParse(cleaned);
  return { ok: false, fields, fallback: toQuery(kind, retry.success ? retry.data : {}) };
}

function crossCheck(data: { minW?: number; maxW?: number }) {
  const fields: Record<string, string> = {};
  if (data.minW !== undefined && data.maxW !== undefined && data.minW > data.maxW) fields.maxW = "maxW must not be below minW.";
  return fields;
}

function toQuery<K extends PartKind>(kind: K, data: Record<string, unknown>): PartListQuery<K> {
  const modules: ModuleFilters = {};
  if (kind === "modules") {
    modules.technology = data.technology as ModuleFilters["technology"];
    modules.minW = data.minW as number | undefined;
    modules.maxW = data.maxW as number | undefined;
    modules.hasReadings = data.hasReadings === undefined ? undefined : data.hasReadings === "true";
    modules.ratioBelow = data.ratioBelow as number | undefined;
  }
  return {
    kind,
    q: (data.q as string | undefined) ?? "",
    sort: ((data.sort as string | undefined) ?? "maker") as PartListQuery<K>["sort"],
    dir: (data.dir as "asc" | "desc" | undefined) ?? "asc",
    limit: (data.limit as number | undefined) ?? DEFAULT_PAGE_SIZE,
    offset: (data.offset as number | undefined) ?? 0,
    modules,
    chemistry: data.chemistry as PartListQuery["chemistry"],
    controllerType: data.type as PartListQuery["controllerType"],
    dcV: data.dcV === undefined ? undefined : Number(data.dcV),
  };
}
