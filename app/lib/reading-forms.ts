// One schema for the field-reading form, used by the browser (errors at the field as you type) and
// by the server (the truth). The JSON preview API shares the conditions part.
import { z } from "zod";
import { PHOTO_MAX_BYTES } from "./image-type";
import { localTimeToUtc } from "~/domain/readings/reading-time";
import { SWEEP_CSV_MAX_BYTES, SWEEP_MAX_POINTS } from "~/domain/readings/sweep-csv";

export const IRRADIANCE_SOURCES = ["pyranometer", "reference-cell", "clear-sky-estimate"] as const;
export const READING_KINDS = ["single", "sweep"] as const;

function number(label: string, unit: string, min: number, max: number) {
  const range = `${label} must be from ${min} to ${max} ${unit}.`.replace(/ $/, "");
  return z
    .number({ error: (issue) => (issue.input === undefined ? `Enter the ${label.toLowerCase()}.` : `Enter the ${label.toLowerCase()} as a number.`) })
    .min(min, range)
    .max(max, range);
}

export const readingConditionsShape = {
  moduleId: z.uuid({ error: "Choose the module model." }),
  kind: z.enum(READING_KINDS, { error: "Choose one reading or a load sweep." }),
  measuredPmaxW: number("Power", "W", 0.1, 5000).optional(),
  measuredVoltageV: number("Voltage", "V", 0.1, 1500).optional(),
  measuredCurrentA: number("Current", "A", 0.001, 100).optional(),
  sweepDurationS: number("Sweep duration", "s", 0, 600).optional(),
  takenAtLocal: z.string({ error: "Enter the date and time of the reading." }).trim().min(1, "Enter the date and time of the reading."),
  utcOffsetH: number("UTC offset", "h", -12, 14),
  latitudeDeg: number("Latitude", "°", -90, 90),
  longitudeDeg: number("Longitude", "°", -180, 180),
  tiltDeg: number("Tilt", "°", 0, 90),
  azimuthDeg: number("Azimuth", "°", 0, 360),
  airTempC: number("Air temperature", "°C", -40, 60),
  moduleTempC: number("Back-sheet temperature", "°C", -40, 100).optional(),
  irradianceSource: z.enum(IRRADIANCE_SOURCES, { error: "Say how the irradiance was found." }),
  irradianceWm2: number("Irradiance", "W/m²", 100, 1500).optional(),
  instrument: z.string({ error: "Name the instruments used." }).trim().min(3, "Name the instruments used.").max(200, "Keep it under 200 characters."),
  method: z
    .string({ error: "Describe how you measured." })
    .trim()
    .min(10, "Describe how you measured, in a sentence or two.")
    .max(2000, "Keep it under 2000 characters."),
};

interface ConditionalFields {
  kind: (typeof READING_KINDS)[number];
  measuredPmaxW?: number;
  measuredVoltageV?: number;
  measuredCurrentA?: number;
  irradianceSource: (typeof IRRADIANCE_SOURCES)[number];
  irradianceWm2?: number;
  takenAtLocal: string;
  utcOffsetH: number;
}

/** Checks that depend on other fields; `hasSweep` tells whether a sweep came with the submission. */
export function checkConditionalFields(value: ConditionalFields, hasSweep: boolean, ctx: z.RefinementCtx) {
  const issue = (path: string, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
  if (value.kind === "single") {
    const { measuredPmaxW: p, measuredVoltageV: v, measuredCurrentA: i } = value;
    if (p === undefined && (v === undefined || i === undefined)) issue("measuredPmaxW", "Enter the power, or both the voltage and the current.");
    if (p !== undefined && v !== undefined && i !== undefined && Math.abs(v * i - p) > 0.05 * p) {
      issue("measuredPmaxW", `${p} W differs from voltage × current = ${(v * i).toFixed(1)} W; enter one or make them agree.`);
    }
  } else if (!hasSweep) {
    issue("sweepFile", "Attach the load sweep as a CSV file.");
  }
  if (value.irradianceSource !== "clear-sky-estimate" && value.irradianceWm2 === undefined) {
    issue("irradianceWm2", "Enter the measured irradiance, or choose the clear-sky estimate.");
  }
  if (localTimeToUtc(value.takenAtLocal, value.utcOffsetH) === null) issue("takenAtLocal", "Enter a real date and time.");
}

export const readingFormSchema = z
  .object({
    ...readingConditionsShape,
    sweepFile: z
      .file()
      .max(SWEEP_CSV_MAX_BYTES, `The CSV file is larger than ${SWEEP_CSV_MAX_BYTES / 1024} KB.`)
      .optional(),
    photo: z.file({ error: "Attach a photo of the module and the instruments." }).max(PHOTO_MAX_BYTES, "The photo is larger than 5 MB."),
  })
  .superRefine((value, ctx) => checkConditionalFields(value, value.sweepFile !== undefined, ctx));

export type ReadingFormValue = z.infer<typeof readingFormSchema>;

/** JSON body of POST /api/v1/readings/preview: the same fields, the sweep as points or CSV text. */
export const readingPreviewSchema = z
  .object({
    ...readingConditionsShape,
    sweep: z
      .array(z.object({ voltageV: z.number(), currentA: z.number() }))
      .max(SWEEP_MAX_POINTS, `At most ${SWEEP_MAX_POINTS} points.`)
      .optional(),
    sweepCsv: z.string().max(SWEEP_CSV_MAX_BYTES).optional(),
  })
  .superRefine((value, ctx) => checkConditionalFields(value, value.sweep !== undefined || value.sweepCsv !== undefined, ctx));

export type ReadingPreviewBody = z.infer<typeof readingPreviewSchema>;

export const decisionSchema = z
  .object({
    intent: z.literal("decide"),
    readingId: z.uuid(),
    decision: z.enum(["approved", "rejected"], { error: "Approve or reject." }),
    reason: z.string().trim().max(1000, "Keep the reason under 1000 characters.").optional(),
  })
  .superRefine((value, ctx) => {
    if (value.decision === "rejected" && (value.reason ?? "").length < 5) {
      ctx.addIssue({ code: "custom", path: ["reason"], message: "Give the submitter a reason for rejecting." });
    }
  });

export const bulkDecisionSchema = z
  .object({
    intent: z.literal("bulk"),
    readingIds: z.array(z.uuid()).min(1, "Tick at least one reading.").max(100, "At most 100 readings at once."),
    decision: z.enum(["approved", "rejected"], { error: "Approve or reject." }),
    reason: z.string().trim().max(1000, "Keep the reason under 1000 characters.").optional(),
  })
  .superRefine((value, ctx) => {
    if (value.decision === "rejected" && (value.reason ?? "").length < 5) {
      ctx.addIssue({ code: "custom", path: ["reason"], message: "Give the submitters a reason for rejecting." });
    }
  });

export const DEFAULT_APPROVAL_REASON = "Approved: the conditions and evidence are in order.";
