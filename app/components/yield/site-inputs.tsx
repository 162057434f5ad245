import type { YieldFormState } from "~/lib/yield-form";
import { NumberInput } from "./number-input";

function tiltHint(latitudeText: string) {
  const latitude = Number(latitudeText);
  if (!Number.isFinite(latitude)) return undefined;
  const facing = latitude >= 0 ? "south (180°)" : "north (0°)";
  // Common practice, no source: an off-grid array tilted about latitude + 10–15° favours the winter months.
  const winter = Math.min(90, Math.round(Math.abs(latitude) + 12));
  return `Equator-facing is ${facing}. Tilt ≈ latitude (${Math.round(Math.abs(latitude))}°) balances the year; ≈ ${winter}° favours winter.`;
}

export function SiteInputs({
  state,
  errors,
  update,
}: {
  state: YieldFormState;
  errors: Record<string, string>;
  update: (patch: Partial<YieldFormState>) => void;
}) {
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-2 gap-3">
        <NumberInput
          id="latitude"
          label="Latitude"
          unit="° N +, S −"
          value={state.latitudeDeg}
          onChange={(v) => update({ latitudeDeg: v })}
          error={errors["site.latitudeDeg"]}
        />
        <NumberInput
          id="longitude"
          label="Longitude"
          unit="° E +, W −"
          value={state.longitudeDeg}
          onChange={(v) => update({ longitudeDeg: v })}
          error={errors["site.longitudeDeg"]}
        />
        <NumberInput id="tilt" label="Tilt" unit="° from flat" value={state.tiltDeg} onChange={(v) => update({ tiltDeg: v })} error={errors["site.tiltDeg"]} />
        <NumberInput
          id="azimuth"
          label="Faces"
          unit="° compass"
          value={state.azimuthDeg}
          onChange={(v) => update({ azimuthDeg: v })}
          error={errors["site.azimuthDeg"]}
        />
        <NumberInput id="albedo" label="Ground albedo" unit="0–1" value={state.albedo} onChange={(v) => update({ albedo: v })} error={errors["site.albedo"]} />
      </div>
      <p className="text-xs text-ink-faint">{tiltHint(state.latitudeDeg)}</p>
      <fieldset className="text-sm">
        <legend className="mb-1 font-medium">Irradiation source</legend>
        <label className="mr-4 inline-flex items-center gap-1.5">
          <input
            type="radio"
            name="irradianceSource"
            checked={state.irradianceSource === "measured"}
            onChange={() => update({ irradianceSource: "measured" })}
          />
          My weather data (horizontal kWh/m²/day)
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input
            type="radio"
            name="irradianceSource"
            checked={state.irradianceSource === "clearness-index"}
            onChange={() => update({ irradianceSource: "clearness-index" })}
          />
          Assume a clearness index
        </label>
      </fieldset>
    </div>
  );
}
