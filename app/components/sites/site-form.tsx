// The whole site editor: customer, place, array, climate. One Conform form, the shared zod schema.
import { getFormProps, getInputProps, getSelectProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useEffect, useState } from "react";
import { Form, useNavigation } from "react-router";
import { FieldError, FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { CLEARNESS_PRESETS, equatorAzimuthDeg, poleFacingWarning, siteFormSchema, type SiteForm } from "~/lib/site-forms";
import { MonthlyPaste } from "./monthly-paste";
import { SiteClimateTable } from "./site-climate-table";

function tiltHint(latitude: unknown) {
  const lat = Number(latitude);
  if (latitude === "" || latitude === undefined || !Number.isFinite(lat))
    return "Equator-facing: south (180°) in the northern hemisphere, north (0°) in the southern.";
  // Common practice, no source: tilt ≈ latitude balances the year; ≈ latitude + 10–15° favours winter.
  return `Equator-facing is ${lat >= 0 ? "south (180°)" : "north (0°)"}. Tilt ≈ ${Math.round(Math.abs(lat))}° balances the year; ≈ ${Math.min(90, Math.round(Math.abs(lat) + 12))}° favours the dark months.`;
}

export function SiteFormView({
  defaultValue,
  lastResult,
  submitLabel,
  azimuthFollowsLatitude = false,
}: {
  defaultValue: Partial<SiteForm> & { months: SiteForm["months"] };
  lastResult?: SubmissionResult<string[]> | null;
  submitLabel: string;
  /** A new site: until the installer types a direction, the array faces the equator of the latitude typed. */
  azimuthFollowsLatitude?: boolean;
}) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult,
    defaultValue,
    constraint: getZodConstraint(siteFormSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: siteFormSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const measured = fields.irradianceSource.value !== "clearness-preset";
  const [azimuthTouched, setAzimuthTouched] = useState(!azimuthFollowsLatitude);
  const latitudeText = fields.latitudeDeg.value;
  useEffect(() => {
    const lat = Number(latitudeText);
    if (azimuthTouched || typeof latitudeText !== "string" || latitudeText.trim() === "" || !Number.isFinite(lat)) return;
    const equator = String(equatorAzimuthDeg(lat));
    if (fields.azimuthDeg.value !== equator) form.update({ name: fields.azimuthDeg.name, value: equator });
  }, [latitudeText, azimuthTouched]);
  const azimuthWarning = poleFacingWarning(latitudeText, fields.azimuthDeg.value);
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-6">
      <FormErrors errors={form.errors} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Customer">
          <div className="space-y-3">
            <TextField field={fields.name} label="Site name" hint="For example: Vell Ridge hut, north roof" />
            <TextField field={fields.customerName} label="Customer" autoComplete="off" />
            <div className="grid grid-cols-2 gap-3">
              <TextField field={fields.customerEmail} label="E-mail (optional)" type="email" />
              <TextField field={fields.customerPhone} label="Phone (optional)" />
            </div>
          </div>
        </Panel>
        <Panel title="Place and array">
          <div className="grid grid-cols-2 gap-3">
            <TextField field={fields.latitudeDeg} label="Latitude (° N +, S −)" />
            <TextField field={fields.longitudeDeg} label="Longitude (° E +, W −)" />
            <TextField field={fields.elevationM} label="Elevation (m)" />
            <TextField field={fields.timeZone} label="Time zone" hint="e.g. Europe/Vienna" />
            <TextField field={fields.tiltDeg} label="Array tilt (° from flat)" />
            {/* Only the installer's own typing (a trusted event) stops the direction following the latitude. */}
            <div onInputCapture={(e) => e.nativeEvent.isTrusted && setAzimuthTouched(true)}>
              <TextField field={fields.azimuthDeg} label="Array faces (° compass)" />
              {azimuthWarning ? (
                <p className="mt-1 flex gap-1 text-sm text-warn" role="status" data-testid="azimuth-warning">
                  <span aria-hidden="true">⚠</span>
                  {azimuthWarning}
                </p>
              ) : null}
            </div>
            <TextField field={fields.albedo} label="Ground albedo (0–1)" />
            <TextField field={fields.shadingDeratePct} label="Shading derate (%)" />
            <TextField field={fields.coldestTempC} label="Coldest expected air (°C)" hint="Sets the cold-morning string voltage." />
            <TextField
              field={fields.hottestTempC}
              label="Hottest expected air (°C, optional)"
              hint="The hottest afternoon you design for (blank: the hottest month's mean daily maximum). Hot modules give less voltage."
            />
          </div>
          <p className="mt-2 text-xs text-ink-faint">{tiltHint(fields.latitudeDeg.value)}</p>
        </Panel>
      </div>
      <Panel title="Monthly climate">
        <fieldset className="mb-3 text-sm">
          <legend className="mb-1 font-medium">Irradiation</legend>
          <label className="mr-4 inline-flex items-center gap-1.5">
            <input {...getInputProps(fields.irradianceSource, { type: "radio", value: "measured" })} />
            From my weather source (monthly mean daily, horizontal)
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input {...getInputProps(fields.irradianceSource, { type: "radio", value: "clearness-preset" })} />
            Assume a sky (clearness index) — shown as an assumption everywhere
          </label>
          <FieldError errors={fields.irradianceSource.errors} />
        </fieldset>
        {measured ? (
          <MonthlyPaste
            onValues={(rows) =>
              form.update({
                name: fields.months.name,
                value: rows.map((r, i) => {
                  const current = Array.isArray(fields.months.value) ? (fields.months.value[i] ?? {}) : {};
                  return { ...current, ...Object.fromEntries(Object.entries(r).filter(([, v]) => v !== undefined)) };
                }),
              })
            }
          />
        ) : (
          <div className="mb-3">
            <label htmlFor={fields.clearnessPreset.id} className="mb-1 block text-sm font-medium">
              Sky preset
            </label>
            <select {...getSelectProps(fields.clearnessPreset)} className="max-w-full rounded-md border border-rule bg-sheet px-3 py-2">
              <option value="">Choose…</option>
              {Object.entries(CLEARNESS_PRESETS).map(([key, p]) => (
                <option key={key} value={key}>
                  {p.label} (clearness index {p.clearnessIndex})
                </option>
              ))}
            </select>
            <FieldError errors={fields.clearnessPreset.errors} />
          </div>
        )}
        <div className="mt-3 overflow-x-auto">
          <SiteClimateTable months={fields.months} measured={measured} />
        </div>
        <FieldError errors={fields.months.errors} />
      </Panel>
      <Panel title="Notes">
        <textarea
          {...getInputProps(fields.notes, { type: "text" })}
          rows={3}
          className="w-full rounded-md border border-rule bg-sheet p-2"
          aria-label="Notes"
        />
      </Panel>
      <SubmitButton pending={navigation.state === "submitting"}>{submitLabel}</SubmitButton>
    </Form>
  );
}
