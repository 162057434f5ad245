// When, where and in what conditions the reading was taken.
import type { FieldMetadata } from "@conform-to/react";
import { FieldError } from "~/components/form-field";
import { UnitField } from "./unit-field";

type NumberField = FieldMetadata<number | undefined>;

export interface ConditionFields {
  takenAtLocal: FieldMetadata<string | undefined>;
  utcOffsetH: NumberField;
  latitudeDeg: NumberField;
  longitudeDeg: NumberField;
  tiltDeg: NumberField;
  azimuthDeg: NumberField;
  airTempC: NumberField;
  moduleTempC: NumberField;
  irradianceSource: FieldMetadata<string | undefined>;
  irradianceWm2: NumberField;
}

export function TimePlaceFields({ fields }: { fields: ConditionFields }) {
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <UnitField field={fields.takenAtLocal} label="Date and time" type="datetime-local" hint="Local time at the place of the reading." />
      <UnitField field={fields.utcOffsetH} label="UTC offset" unit="h" hint="Hours ahead of UTC there: 1 for UTC+1, −5 for UTC−5." />
      <UnitField field={fields.latitudeDeg} label="Latitude" unit="°, north positive" />
      <UnitField field={fields.longitudeDeg} label="Longitude" unit="°, east positive" />
      <UnitField field={fields.tiltDeg} label="Module tilt" unit="° from horizontal" />
      <UnitField field={fields.azimuthDeg} label="Module azimuth" unit="° compass, 180 = south" hint="The direction the module faces." />
    </div>
  );
}

export function TemperatureFields({ fields }: { fields: ConditionFields }) {
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <UnitField field={fields.airTempC} label="Air temperature" unit="°C" hint="In the shade, near the module." />
      <UnitField
        field={fields.moduleTempC}
        label="Back-sheet temperature"
        unit="°C"
        optional
        hint="A thermometer on the back of the module, behind a cell. Without it the cell temperature is estimated."
      />
    </div>
  );
}

const SOURCES = [
  ["pyranometer", "Measured with a pyranometer"],
  ["reference-cell", "Measured with a reference cell"],
  ["clear-sky-estimate", "Not measured — use the clear-sky estimate (weighted lower)"],
] as const;

export function IrradianceFields({ fields, source, onSource }: { fields: ConditionFields; source: string; onSource: (source: string) => void }) {
  return (
    <div className="space-y-3">
      <fieldset>
        <legend className="mb-1 text-sm font-medium">In-plane irradiance</legend>
        <div className="space-y-1">
          {SOURCES.map(([value, label]) => (
            <label key={value} className="flex items-center gap-2 text-sm">
              <input type="radio" name={fields.irradianceSource.name} value={value} checked={source === value} onChange={() => onSource(value)} />
              {label}
            </label>
          ))}
        </div>
        <FieldError id={fields.irradianceSource.errorId} errors={fields.irradianceSource.errors} />
      </fieldset>
      {source === "clear-sky-estimate" ? (
        <p className="rounded-md border border-rule bg-paper px-3 py-2 text-sm text-ink-soft">
          The engine estimates the irradiance on the module's plane for that time, place and orientation under a clear sky (Haurwitz 1945). Haze or thin cloud
          make the real value lower, so the reading is marked as estimated and counts half.
        </p>
      ) : (
        <UnitField
          field={fields.irradianceWm2}
          label="Irradiance in the module's plane"
          unit="W/m²"
          hint="Sensor held at the module's tilt and azimuth, read during the sweep."
        />
      )}
    </div>
  );
}
