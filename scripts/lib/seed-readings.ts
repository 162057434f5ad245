// Demo field readings (data/demo/readings.ts): for each, a sweep or a single reading is drawn from
// the explicit I–V model of the module at the day's conditions so that it normalises to the line's
// share of nameplate, then the engine normalises it exactly as a submitted reading. Approved and
// rejected ones get the curator's decision; each module's verified figures are then recomputed.
// Idempotent: a reading is matched on module, submitter and time.
import type { Kysely } from "kysely";
import type { Database } from "../../app/server/db-schema";
import { DEMO_READINGS, VELL_READING_PLACE, type DemoReading } from "../../data/demo/readings";
import { demoModulePhoto } from "./demo-photo";

type ModuleRow = {
  id: string;
  pmax_w: number;
  vmp_v: number;
  imp_a: number;
  voc_v: number;
  isc_a: number;
  gamma_pmax_pct_per_c: number;
  beta_voc_pct_per_c: number;
  alpha_isc_pct_per_c: number;
  noct_c: number;
};

/** A deterministic generator, so the demo draws the same sweeps every time. */
function lcg(seed: number) {
  let state = seed % 2147483647 || 1;
  return () => {
    state = (state * 16807) % 2147483647;
    return state / 2147483647 - 0.5;
  };
}

async function drawMeasurement(spec: DemoReading, module: ModuleRow, index: number) {
  const { clearSkyPlaneOfArrayAt } = await import("../../app/domain/solar/instant-irradiance");
  const { readingCellTemperatureC } = await import("../../app/domain/solar/stc-translation");
  const { explicitIvModel, currentAtVoltageA, modelMaximumPowerW, translateKeyPoints } = await import("../../app/domain/solar/iv-model");
  const { localTimeToUtc } = await import("../../app/domain/readings/reading-time");
  const takenAtUtc = localTimeToUtc(spec.takenAtLocal, VELL_READING_PLACE.utcOffsetH)!;
  const irradianceWm2 =
    spec.irradiance.source === "clear-sky-estimate"
      ? clearSkyPlaneOfArrayAt({ instantUtc: takenAtUtc, ...VELL_READING_PLACE, tiltDeg: spec.tiltDeg, azimuthDeg: spec.azimuthDeg, albedo: 0.2 }).poaWm2
      : spec.irradiance.wm2;
  const cellC =
    spec.backSheetC === null
      ? readingCellTemperatureC({ kind: "air", airC: spec.airTempC, noctC: module.noct_c }, irradianceWm2)
      : readingCellTemperatureC({ kind: "back-sheet", backSheetC: spec.backSheetC }, irradianceWm2);
  const targetW = spec.stcRatio * module.pmax_w * (irradianceWm2 / 1000) * (1 + (module.gamma_pmax_pct_per_c / 100) * (cellC - 25));
  const keyPoints = translateKeyPoints(
    { vocV: module.voc_v, iscA: module.isc_a, vmpV: module.vmp_v, impA: module.imp_a },
    { alphaIscPerC: module.alpha_isc_pct_per_c / 100, betaVocPerC: module.beta_voc_pct_per_c / 100, gammaPmaxPerC: module.gamma_pmax_pct_per_c / 100 },
    irradianceWm2,
    cellC,
  );
  const unscaled = modelMaximumPowerW(explicitIvModel(keyPoints));
  // A weaker (or stronger) module than its datasheet: scale the current to hit the target power.
  const scale = targetW / unscaled.pmaxW;
  const curve = explicitIvModel({ ...keyPoints, iscA: keyPoints.iscA * scale, impA: keyPoints.impA * scale });
  if (spec.kind === "single") {
    const mpp = modelMaximumPowerW(curve);
    return { takenAtUtc, single: { pmaxW: Math.round(mpp.pmaxW * 10) / 10, voltageV: Math.round(mpp.vmpV * 100) / 100 } };
  }
  const noise = lcg(1000 + index * 7919);
  const count = 48 + (index % 4) * 10;
  const points = Array.from({ length: count }, (_, i) => {
    const voltageV = (curve.vocV * 1.002 * i) / (count - 1);
    const currentA = Math.max(0, currentAtVoltageA(curve, voltageV) + 0.004 * curve.iscA * noise());
    return { voltageV: Math.round(voltageV * 1000) / 1000, currentA: Math.round(currentA * 10000) / 10000 };
  });
  return { takenAtUtc, sweep: { points, durationS: 0.6 + (index % 5) * 0.2 } };
}

export async function seedDemoReadings(db: Kysely<Database>, log: (line: string) => void) {
  const { evaluateReading } = await import("../../app/domain/readings/evaluate-reading");
  const { recomputeVerifiedFigures } = await import("../../app/server/catalogue/verified-figures.server");
  const emails = [...new Set(DEMO_READINGS.map((r) => r.submitter)), "curator@kitwright.example"];
  const people = await db
    .selectFrom("user")
    .leftJoin("member", "member.userId", "user.id")
    .select(["user.id", "user.email", "member.organizationId as teamId"])
    .where("user.email", "in", emails)
    .execute();
  const person = (email: string) => people.find((p) => p.email === email);
  const curatorId = person("curator@kitwright.example")?.id ?? null;
  const touched = new Set<string>();
  let inserted = 0;

  for (const [index, spec] of DEMO_READINGS.entries()) {
    const module = await db.selectFrom("pv_module").selectAll().where("maker", "=", spec.maker).where("model", "=", spec.model).executeTakeFirst();
    const submitter = person(spec.submitter);
    if (!module || !submitter) {
      log(`skipped a demo reading of ${spec.maker} ${spec.model}: module or submitter missing`);
      continue;
    }
    const drawn = await drawMeasurement(spec, module, index);
    const existing = await db
      .selectFrom("field_reading")
      .select("id")
      .where("module_id", "=", module.id)
      .where("submitted_by", "=", submitter.id)
      .where("taken_at", "=", drawn.takenAtUtc)
      .executeTakeFirst();
    touched.add(module.id);
    if (existing) continue;

    const evaluation = evaluateReading(
      {
        kind: spec.kind,
        measuredPmaxW: drawn.single?.pmaxW,
        takenAtLocal: spec.takenAtLocal,
        ...VELL_READING_PLACE,
        tiltDeg: spec.tiltDeg,
        azimuthDeg: spec.azimuthDeg,
        airTempC: spec.airTempC,
        moduleTempC: spec.backSheetC ?? undefined,
        irradianceSource: spec.irradiance.source,
        irradianceWm2: spec.irradiance.source === "clear-sky-estimate" ? undefined : spec.irradiance.wm2,
        sweepDurationS: drawn.sweep?.durationS,
      },
      { pmaxW: module.pmax_w, gammaPmaxPctPerC: module.gamma_pmax_pct_per_c, noctC: module.noct_c },
      drawn.sweep ? { points: drawn.sweep.points } : null,
      // The demo's dates are fixed; the form's "not in the future" rule is not the seed's concern.
      new Date("2100-01-01T00:00:00Z"),
    );
    if (!evaluation.ok) throw new Error(`demo reading ${index} (${spec.model}) does not normalise: ${evaluation.message}`);
    const { reading, sweep } = evaluation;
    const createdAt = new Date(drawn.takenAtUtc.getTime() + 3 * 3600_000);
    await db.transaction().execute(async (trx) => {
      const photo = demoModulePhoto(index);
      const { createHash } = await import("node:crypto");
      const file = await trx
        .insertInto("stored_file")
        .values({
          uploaded_by: submitter.id,
          content_type: "image/png",
          byte_size: photo.byteLength,
          sha256: createHash("sha256").update(photo).digest("hex"),
          bytes: photo,
          created_at: createdAt,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      const row = await trx
        .insertInto("field_reading")
        .values({
          module_id: module.id,
          submitted_by: submitter.id,
          team_id: submitter.teamId,
          status: spec.status,
          kind: spec.kind,
          measured_pmax_w: reading.measuredPmaxW,
          measured_vmp_v: sweep ? sweep.analysis.vmpV : (drawn.single?.voltageV ?? null),
          measured_imp_a: sweep ? sweep.analysis.impA : drawn.single ? drawn.single.pmaxW / drawn.single.voltageV : null,
          measured_voc_v: sweep?.analysis.vocV ?? null,
          measured_isc_a: sweep?.analysis.iscA ?? null,
          fill_factor: sweep?.analysis.fillFactor ?? null,
          sweep: sweep ? JSON.stringify(sweep.points) : null,
          sweep_duration_s: sweep?.durationS ?? null,
          taken_at: drawn.takenAtUtc,
          utc_offset_min: VELL_READING_PLACE.utcOffsetH * 60,
          latitude_deg: VELL_READING_PLACE.latitudeDeg,
          longitude_deg: VELL_READING_PLACE.longitudeDeg,
          tilt_deg: spec.tiltDeg,
          azimuth_deg: spec.azimuthDeg,
          air_temp_c: spec.airTempC,
          module_temp_c: spec.backSheetC,
          irradiance_wm2: reading.irradianceWm2,
          irradiance_source: reading.irradianceSource,
          instrument: spec.instrument,
          method: spec.method,
          photo_id: file.id,
          cell_temp_c: reading.cellTempC,
          stc_pmax_w: reading.stcPmaxW,
          uncertainty_pct: reading.uncertaintyPct,
          weight: reading.weight,
          flags: JSON.stringify(reading.flags),
          normalisation: JSON.stringify(reading.working),
          created_at: createdAt,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      if (spec.status !== "pending") {
        await trx
          .insertInto("reading_decision")
          .values({
            reading_id: row.id,
            decided_by: curatorId,
            decision: spec.status,
            reason: spec.reason ?? "Clear conditions, instruments in plane, photo shows the module's label.",
            decided_at: new Date(createdAt.getTime() + 26 * 3600_000),
          })
          .execute();
      }
    });
    inserted += 1;
  }
  for (const moduleId of touched) await recomputeVerifiedFigures(db, moduleId);
  if (inserted) log(`${inserted} demo field readings`);
}
