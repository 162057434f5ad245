// A site without the installer's own irradiation uses a sky preset (a clearness index for every month).
// That is an assumption, and every screen and document that shows the energy says so in the same
// words: the wording lives here only.

/** Clearness-index presets for sites without weather data (common practice, no source: round values). */
export const SKY_PRESETS = {
  arid: { label: "Arid, mostly clear skies", words: "arid, mostly clear skies", clearnessIndex: 0.65 },
  temperate: { label: "Temperate, mixed skies", words: "temperate, mixed skies", clearnessIndex: 0.5 },
  overcast: { label: "Often overcast", words: "often overcast skies", clearnessIndex: 0.35 },
} as const;
export type SkyPreset = keyof typeof SKY_PRESETS;

export interface SkyAssumption {
  /** The preset's key when the clearness indices are exactly one preset's; null for other values. */
  preset: SkyPreset | null;
  /** Lowest and highest assumed monthly clearness index (equal for a preset). */
  clearnessMin: number;
  clearnessMax: number;
  /** Months (1–12) with an assumed sky; all twelve for a site on a preset. */
  months: number[];
}

export function isSkyPreset(value: unknown): value is SkyPreset {
  return typeof value === "string" && Object.hasOwn(SKY_PRESETS, value);
}

/** The assumption of a site stored with a preset (null when it has the installer's own irradiation). */
export function skyAssumptionOfPreset(preset: string | null | undefined): SkyAssumption | null {
  if (!isSkyPreset(preset)) return null;
  const kt = SKY_PRESETS[preset].clearnessIndex;
  return { preset, clearnessMin: kt, clearnessMax: kt, months: Array.from({ length: 12 }, (_, i) => i + 1) };
}

/**
 * The assumption behind computed monthly figures (the engine marks each month "measured" or
 * "clearness-index"); null when every month rests on measured irradiation. Works on saved plans
 * too, since their result keeps the engine's months.
 */
export function skyAssumptionOfMonths(
  months: readonly { month: number; irradianceSource: "measured" | "clearness-index"; clearnessIndex: number }[] | undefined,
): SkyAssumption | null {
  const assumed = (months ?? []).filter((m) => m.irradianceSource === "clearness-index");
  if (assumed.length === 0) return null;
  // The engine recomputes the index from the irradiation it made of it: 0.35 can come back as 0.34999….
  const values = assumed.map((m) => Math.round(m.clearnessIndex * 1000) / 1000);
  const clearnessMin = Math.min(...values);
  const clearnessMax = Math.max(...values);
  const preset =
    clearnessMin === clearnessMax ? ((Object.keys(SKY_PRESETS) as SkyPreset[]).find((k) => SKY_PRESETS[k].clearnessIndex === clearnessMin) ?? null) : null;
  return { preset, clearnessMin, clearnessMax, months: assumed.map((m) => m.month) };
}

const MONTH_SHORT = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

function clearnessWords(a: SkyAssumption) {
  return a.clearnessMin === a.clearnessMax ? a.clearnessMin.toFixed(2) : `${a.clearnessMin.toFixed(2)}–${a.clearnessMax.toFixed(2)}`;
}

function monthWords(a: SkyAssumption) {
  return a.months.length >= 12 ? "" : ` for ${a.months.map((m) => MONTH_SHORT[m - 1]).join(", ")}`;
}

/** The full sentence, for captions, the site page and the customer's quote (plain words first). */
export function skyAssumptionSentence(a: SkyAssumption): string {
  const sky = a.preset ? `typical ${SKY_PRESETS[a.preset].words}` : "an assumed sky";
  return `Sunshine estimated for ${sky}${monthWords(a)} (clearness index ${clearnessWords(a)}), not measured at the site.`;
}

/** A short form for lists and badges. */
export function skyAssumptionShort(a: SkyAssumption): string {
  return `Assumed sky: ${a.preset ? SKY_PRESETS[a.preset].label.toLowerCase() : "custom"}, clearness index ${clearnessWords(a)}${monthWords(a)}`;
}
