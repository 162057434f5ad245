// Storing a submitted field reading: the photo's type is checked by content, the sweep is read and
// analysed, the reading normalised, and the photo and the reading are written in one transaction
// (nothing is half-saved).
import { db } from "../db.server";
import { storePhoto } from "./stored-files.server";
import { findReadableModule } from "./reading-queries.server";
import { evaluateReading } from "~/domain/readings/evaluate-reading";
import { detectPhotoType } from "~/lib/image-type";
import type { ReadingFormValue } from "~/lib/reading-forms";

export type SubmitOutcome = { ok: true; readingId: string } | { ok: false; fieldErrors: Record<string, string[]> };

export function moduleForEngine(module: { pmax_w: number; gamma_pmax_pct_per_c: number; noct_c: number }) {
  return { pmaxW: module.pmax_w, gammaPmaxPctPerC: module.gamma_pmax_pct_per_c, noctC: module.noct_c };
}

export async function submitReading(value: ReadingFormValue, submitter: { userId: string; teamId: string }, now = new Date()): Promise<SubmitOutcome> {
  const fieldErrors: Record<string, string[]> = {};
  const module = await findReadableModule(value.moduleId);
  if (!module) return { ok: false, fieldErrors: { moduleId: ["No such module in the catalogue."] } };
  if (module.merged_into) return { ok: false, fieldErrors: { moduleId: ["This model was merged into another entry; choose that one."] } };

  const photoBytes = Buffer.from(await value.photo.arrayBuffer());
  const photoType = detectPhotoType(photoBytes);
  if (!photoType) fieldErrors.photo = ["This file is not a JPEG, PNG or WebP image (its content was checked, not its name)."];

  const csv = value.kind === "sweep" && value.sweepFile ? await value.sweepFile.text() : null;
  const evaluation = evaluateReading(value, moduleForEngine(module), csv === null ? null : { csv }, now);
  if (!evaluation.ok) fieldErrors[evaluation.field] = [evaluation.message];
  if (!evaluation.ok || !photoType) return { ok: false, fieldErrors };

  const { reading, sweep, takenAtUtc } = evaluation;
  const singleV = value.kind === "single" && value.measuredCurrentA !== undefined ? (value.measuredVoltageV ?? null) : null;
  const singleI = value.kind === "single" && value.measuredVoltageV !== undefined ? (value.measuredCurrentA ?? null) : null;
  const readingId = await db.transaction().execute(async (trx) => {
    const photoId = await storePhoto(trx, photoBytes, photoType, submitter.userId);
    const row = await trx
      .insertInto("field_reading")
      .values({
        module_id: module.id,
        submitted_by: submitter.userId,
        team_id: submitter.teamId,
        kind: value.kind,
        measured_pmax_w: reading.measuredPmaxW,
        measured_vmp_v: sweep ? sweep.analysis.vmpV : singleV,
        measured_imp_a: sweep ? sweep.analysis.impA : singleI,
        measured_voc_v: sweep ? sweep.analysis.vocV : null,
        measured_isc_a: sweep ? sweep.analysis.iscA : null,
        fill_factor: sweep ? sweep.analysis.fillFactor : null,
        sweep: sweep ? JSON.stringify(sweep.points) : null,
        sweep_duration_s: sweep ? sweep.durationS : null,
        taken_at: takenAtUtc,
        utc_offset_min: Math.round(value.utcOffsetH * 60),
        latitude_deg: value.latitudeDeg,
        longitude_deg: value.longitudeDeg,
        tilt_deg: value.tiltDeg,
        azimuth_deg: value.azimuthDeg,
        air_temp_c: value.airTempC,
        module_temp_c: value.moduleTempC ?? null,
        irradiance_wm2: reading.irradianceWm2,
        irradiance_source: reading.irradianceSource,
        instrument: value.instrument,
        method: value.method,
        photo_id: photoId,
        cell_temp_c: reading.cellTempC,
        stc_pmax_w: reading.stcPmaxW,
        uncertainty_pct: reading.uncertaintyPct,
        weight: reading.weight,
        flags: JSON.stringify(reading.flags),
        normalisation: JSON.stringify(reading.working),
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    return row.id;
  });
  return { ok: true, readingId };
}
