// The site form: customer, place, array orientation and monthly climate. The climate's physical
// checks (ranges, irradiation against what reaches the ground) are the yield API's own site schema,
// so a site that saves is a site the engine accepts.
import { z } from "zod";
import { siteSchema } from "~/domain/solar/yield-request";
import { nameField } from "./name-field";
import { SKY_PRESETS as CLEARNESS_PRESETS, type SkyPreset as ClearnessPreset } from "~/domain/solar/sky-assumption";

// The presets live with the wording that shows them as an assumption (one place for both).
export { SKY_PRESETS as CLEARNESS_PRESETS, type SkyPreset as ClearnessPreset } from "~/domain/solar/sky-assumption";

const num = (label: string) => z.number({ error: (i) => (i.input === undefined ? `Enter the ${label}.` : `The ${label} must be a number.`) });

function isTimeZone(value: string) {
  try {
    new Intl.DateTimeFormat("en", { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

const monthSchema = z.object({
  ghiKWhM2Day: z.number({ error: "Enter a number (kWh/m² per day)." }).optional(),
  tMaxC: num("mean daily maximum"),
  tMinC: num("mean daily minimum"),
  albedo: z.number({ error: "Albedo is a number from 0 to 1." }).optional(),
});

export const siteFormSchema = z
  .object({
    name: nameField("Name the site."),
    customerName: nameField("Enter the customer's name."),
    customerEmail: z.email("Enter a valid e-mail address.").max(254).optional(),
    customerPhone: z.string().trim().max(40).optional(),
    latitudeDeg: num("latitude"),
    longitudeDeg: num("longitude"),
    elevationM: num("elevation").min(-500, "Elevation must be above −500 m.").max(9000, "Elevation must be below 9000 m."),
    timeZone: z
      .string({ error: "Enter the time zone, e.g. Europe/Vienna." })
      .trim()
      .refine(isTimeZone, "Unknown time zone: use a name like Europe/Vienna or America/Lima."),
    tiltDeg: num("tilt"),
    azimuthDeg: num("facing"),
    albedo: num("albedo"),
    shadingDeratePct: num("shading derate").min(0, "Shading derate is 0–80 %.").max(80, "Shading derate is 0–80 %."),
    coldestTempC: num("coldest temperature")
      .min(-60, "The coldest temperature must be at least −60 °C.")
      .max(40, "The coldest temperature must be at most 40 °C."),
    // Optional: blank leaves the hot-afternoon check on the hottest month's mean daily maximum.
    hottestTempC: z
      .number({ error: "The hottest temperature must be a number." })
      .min(-40, "The hottest temperature must be at least −40 °C.")
      .max(60, "The hottest temperature must be at most 60 °C.")
      .optional(),
    irradianceSource: z.enum(["measured", "clearness-preset"], "Choose where the irradiation comes from."),
    clearnessPreset: z.enum(Object.keys(CLEARNESS_PRESETS) as [ClearnessPreset, ...ClearnessPreset[]]).optional(),
    months: z.array(monthSchema).length(12, "Give all 12 months."),
    notes: z.string().trim().max(4000).optional(),
  })
  // Runs even when some fields already failed, so that the installer sees every problem at once;
  // a field that already has a message gets no second one.
  .superRefine(
    (site, ctx) => {
      // Runs even when the body is not an object at all (JSON null, a number): nothing to cross-check.
      if (typeof site !== "object" || site === null) return;
      const taken = new Set(ctx.issues.map((i) => (i.path ?? []).join(".")));
      const add = (path: (string | number)[], message: string) => {
        const key = path.join(".");
        if (taken.has(key)) return;
        taken.add(key);
        ctx.addIssue({ code: "custom", path, message });
      };
      const months = Array.isArray(site.months) ? site.months : [];
      if (site.irradianceSource === "clearness-preset" && !site.clearnessPreset) add(["clearnessPreset"], "Choose a sky preset.");
      if (site.irradianceSource === "measured") {
        months.forEach((m, i) => m && m.ghiKWhM2Day === undefined && add(["months", i, "ghiKWhM2Day"], "Enter the month's irradiation."));
      }
      const minima = months.map((m) => m?.tMinC).filter((t): t is number => typeof t === "number");
      if (typeof site.coldestTempC === "number" && minima.length && site.coldestTempC > Math.min(...minima)) {
        add(["coldestTempC"], "The coldest temperature cannot be above a month's mean minimum.");
      }
      if (typeof site.hottestTempC === "number" && typeof site.coldestTempC === "number" && site.hottestTempC <= site.coldestTempC) {
        add(["hottestTempC"], "The hottest temperature must be above the coldest.");
      }
      // A design high below a month's own mean maximum would make the hot-afternoon check less cautious
      // than leaving it blank: the mirror of the coldest rule.
      const maxima = months.map((m) => m?.tMaxC).filter((t): t is number => typeof t === "number");
      if (typeof site.hottestTempC === "number" && maxima.length && site.hottestTempC < Math.max(...maxima)) {
        add(["hottestTempC"], "The hottest temperature cannot be below a month's mean maximum.");
      }
      const climate = siteSchema.safeParse(toEngineSite(site));
      if (!climate.success) for (const issue of climate.error.issues) add(issue.path as (string | number)[], issue.message);
    },
    { when: () => true },
  );

export type SiteForm = z.output<typeof siteFormSchema>;

/** The site as the yield engine takes it; a preset fills every month's clearness index. */
export function toEngineSite(
  site: Pick<SiteForm, "latitudeDeg" | "longitudeDeg" | "tiltDeg" | "azimuthDeg" | "albedo" | "irradianceSource" | "clearnessPreset" | "months">,
) {
  const kt = site.irradianceSource === "clearness-preset" && site.clearnessPreset ? CLEARNESS_PRESETS[site.clearnessPreset].clearnessIndex : undefined;
  return {
    latitudeDeg: site.latitudeDeg,
    longitudeDeg: site.longitudeDeg,
    tiltDeg: site.tiltDeg,
    azimuthDeg: site.azimuthDeg,
    albedo: site.albedo,
    months: (Array.isArray(site.months) ? site.months : []).map((m) => ({
      ...(kt !== undefined ? { clearnessIndex: kt } : { ghiKWhM2Day: m.ghiKWhM2Day }),
      tMaxC: m.tMaxC,
      tMinC: m.tMinC,
      ...(m.albedo !== undefined ? { albedo: m.albedo } : {}),
    })),
  };
}

/** The compass direction of the equator from the site: south (180°) north of it, north (0°) south of it. */
export function equatorAzimuthDeg(latitudeDeg: number) {
  return latitudeDeg < 0 ? 0 : 180;
}

/**
 * A warning (not an error: a pole-facing roof can be a real choice) when the array faces more than
 * 90° away from the equator, where a tilted array harvests less; null otherwise or while a figure is missing.
 */
export function poleFacingWarning(latitudeDeg: unknown, azimuthDeg: unknown): string | null {
  const lat = typeof latitudeDeg === "string" && latitudeDeg.trim() === "" ? NaN : Number(latitudeDeg);
  const az = typeof azimuthDeg === "string" && azimuthDeg.trim() === "" ? NaN : Number(azimuthDeg);
  if (!Number.isFinite(lat) || !Number.isFinite(az) || latitudeDeg == null || azimuthDeg == null) return null;
  // On the equator no direction is "away" from it.
  if (lat === 0) return null;
  const equator = equatorAzimuthDeg(lat);
  const apart = Math.abs(((((az - equator) % 360) + 540) % 360) - 180);
  if (apart <= 90) return null;
  return `This array faces the pole: tilted, it harvests less than one facing ${equator === 180 ? "south (180°)" : "north (0°)"}, the equator's side at this latitude — the more so the steeper the tilt and the further from the equator. Check the compass direction (0° north, 90° east, 180° south).`;
}
