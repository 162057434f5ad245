// Body of POST /api/v1/yield: one Zod schema, plain-words messages, and a helper that turns
// Zod issues into { "site.months.3.ghiKWhM2Day": "message" } for the API's error answer.
import { z } from "zod";
import { monthlyH0KWhM2Day } from "./day-geometry";
import { moduleSchema } from "./module-request-schema";
import { numberIn, objectError } from "./schema-fields";

export { moduleSchema } from "./module-request-schema";

/** A monthly mean clearness index above this is not seen on Earth; it flags unit mix-ups. */
export const MAX_MONTHLY_CLEARNESS_INDEX = 0.9;
/** Slack for months near polar night, where the average day's H0 is tiny. */
const H0_SLACK_KWH_M2_DAY = 0.1;
const MONTH_NAMES = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

const monthSchema = z
  .object(
    {
      ghiKWhM2Day: numberIn("Horizontal irradiation", 0, 12, " kWh/m²/day").optional(),
      clearnessIndex: z
        .number({ error: "Clearness index must be a number." })
        .gt(0, { error: "Clearness index must be more than 0." })
        .lt(1, { error: "Clearness index must be less than 1." })
        .optional(),
      tMaxC: numberIn("Mean daily maximum temperature", -60, 60, " °C"),
      tMinC: numberIn("Mean daily minimum temperature", -60, 60, " °C"),
      albedo: numberIn("Ground albedo", 0, 1).optional(),
    },
    objectError("Each month"),
  )
  .superRefine((month, ctx) => {
    const hasGhi = month.ghiKWhM2Day !== undefined;
    const hasKt = month.clearnessIndex !== undefined;
    if (hasGhi && hasKt) {
      ctx.addIssue({ code: "custom", path: ["clearnessIndex"], message: "Give either the irradiation or a clearness index, not both." });
    } else if (!hasGhi && !hasKt) {
      ctx.addIssue({ code: "custom", path: ["ghiKWhM2Day"], message: "Give the month's horizontal irradiation or a clearness index." });
    }
    // Zod still runs refinements after a field failed; compare only two valid numbers.
    if (Number.isFinite(month.tMinC) && Number.isFinite(month.tMaxC) && month.tMinC > month.tMaxC) {
      ctx.addIssue({ code: "custom", path: ["tMinC"], message: "The minimum temperature must not be above the maximum." });
    }
  });

export const siteSchema = z
  .object(
    {
      latitudeDeg: numberIn("Latitude", -90, 90, "°"),
      longitudeDeg: numberIn("Longitude", -180, 180, "°"),
      tiltDeg: numberIn("Tilt", 0, 90, "°"),
      azimuthDeg: numberIn("Azimuth", 0, 360, "°"),
      albedo: numberIn("Ground albedo", 0, 1),
      months: z
        .array(monthSchema, { error: "Months must be a list of 12 months, January to December." })
        .length(12, { error: "Give exactly 12 months, January to December." }),
    },
    objectError("Site"),
  )
  .superRefine((site, ctx) => {
    if (!(Math.abs(site.latitudeDeg) <= 90) || !Array.isArray(site.months)) return;
    site.months.forEach((month, index) => {
      if (index >= 12 || typeof month?.ghiKWhM2Day !== "number") return;
      const h0 = monthlyH0KWhM2Day(site.latitudeDeg, index + 1);
      const limit = MAX_MONTHLY_CLEARNESS_INDEX * h0 + H0_SLACK_KWH_M2_DAY;
      if (month.ghiKWhM2Day > limit) {
        ctx.addIssue({
          code: "custom",
          path: ["months", index, "ghiKWhM2Day"],
          message:
            `${month.ghiKWhM2Day} kWh/m²/day is more than can reach the ground at this latitude in ${MONTH_NAMES[index]} ` +
            `(at most about ${limit.toFixed(2)}). Check the units: kWh/m² per day, not MJ/m² or per month.`,
        });
      }
    });
  });

export const yieldRequestSchema = z
  .object(
    {
      site: siteSchema,
      module: moduleSchema,
      powerBasis: z.enum(["nameplate", "verified"], { error: 'Power basis must be "nameplate" or "verified".' }).optional(),
      controller: z.object(
        {
          kind: z.enum(["mppt", "pwm"], { error: 'Controller kind must be "mppt" or "pwm".' }),
          batteryVoltageV: z.union([z.literal(12), z.literal(24), z.literal(48)], {
            error: "Battery voltage must be 12, 24 or 48 V nominal.",
          }),
          efficiencyPct: numberIn("Controller efficiency", 50, 100, " %"),
        },
        objectError("Controller"),
      ),
      lossesPct: z.object(
        {
          soiling: numberIn("Soiling loss", 0, 50, " %"),
          mismatch: numberIn("Mismatch loss", 0, 50, " %"),
          wiring: numberIn("Wiring loss", 0, 50, " %"),
        },
        objectError("Losses"),
      ),
      options: z
        .object({
          cellTempModel: z.enum(["noct", "faiman"], { error: 'Cell temperature model must be "noct" or "faiman".' }).optional(),
          windSpeedMs: numberIn("Wind speed", 0, 30, " m/s").optional(),
        })
        .optional(),
    },
    objectError("The request body"),
  )
  .superRefine((body, ctx) => {
    const module: unknown = body.module;
    if (body.powerBasis === "verified" && typeof module === "object" && module !== null && !("moduleId" in module)) {
      ctx.addIssue({ code: "custom", path: ["powerBasis"], message: "Verified power needs a catalogue module (moduleId)." });
    }
  })
  .transform((body) => ({ ...body, powerBasis: body.powerBasis ?? ("nameplate" as const) }));

export type YieldRequest = z.output<typeof yieldRequestSchema>;

/** First message for each field, keyed by its dot path ("site.months.3.ghiKWhM2Day"). */
export function zodIssuesToFields(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join(".") || "body";
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}
