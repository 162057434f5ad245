// `npm run seed -- --scale N`: N invented module models and 10·N approved field readings for the
// benchmark, made in bulk by PostgreSQL (generate_series) inside one transaction, deterministic
// (setseed) and idempotent (models already present are skipped with their readings).
//
// Readings are plausible, not real: each model gets a "true" field ratio of 0.78–1.03 of its
// nameplate, each reading scatters about it by a few per cent, and the as-measured power is
// derived back from the STC value with the Pmax-only translation P = P_STC·(G/1000)·(1 + γ(Tc − 25))
// and the NOCT cell temperature Tc = Ta + (NOCT − 20)/800·G. One model in ten has no readings, one
// in ten has twenty, the rest ten, so the total is exactly 10·N when N is a multiple of 10.
//
// Verified figures are then set in one SQL pass. recomputeVerifiedFigures uses a weighted median;
// every generated reading has weight 1, and with equal weights the weighted median equals the plain
// median (the two middle values averaged), which PostgreSQL's percentile_cont(0.5) computes. The
// spread is 100 · 1.4826 · MAD / median over the same readings, as recomputeVerifiedFigures does.
import { sql, type Kysely } from "kysely";
import type { Database } from "../../app/server/db-schema";
import { MAD_TO_SIGMA } from "../../app/domain/catalogue/robust-stats";

export const SCALE_MAKER_PREFIX = "Generated Maker";

export async function seedScale(db: Kysely<Database>, count: number, log: (line: string) => void) {
  const started = Date.now();
  const { moduleIds, readings } = await db.transaction().execute(async (trx) => {
    await sql`select setseed(0.4242)`.execute(trx);
    const inserted = await sql<{ id: string }>`
      with p as materialized (
        select g,
          (array['mono-PERC','mono-TOPCon','mono-HJT','poly','thin-film CdTe','thin-film CIGS','mono-PERC','poly'])[1 + g % 8] as tech,
          random() as r_size, random() as r_cells, random() as r_eff, random() as r_coef
        from generate_series(1, ${count}::int) g
      ), s as (
        select *,
          -- Off-grid catalogues hold more small modules than large ones: from 10 W up to 600 W
          -- (monocrystalline), 400 W (poly) or 200 W (thin film), weighted low.
          greatest(10, round((10 + (case when tech = 'poly' then 390 when tech like 'thin-film%' then 190 else 590 end) * r_size * r_size) / 5) * 5) as pmax,
          case tech when 'mono-PERC' then 0.52 when 'mono-TOPCon' then 0.585 when 'mono-HJT' then 0.59 when 'poly' then 0.5
                    when 'thin-film CdTe' then 0.68 else 0.52 end as vmp_cell,
          case tech when 'mono-PERC' then 1.2 when 'mono-TOPCon' then 1.21 when 'mono-HJT' then 1.22 when 'poly' then 1.22
                    when 'thin-film CdTe' then 1.26 else 1.27 end as voc_over_vmp,
          case tech when 'mono-PERC' then 0.205 when 'mono-TOPCon' then 0.222 when 'mono-HJT' then 0.225 when 'poly' then 0.165
                    when 'thin-film CdTe' then 0.175 else 0.15 end * (0.94 + 0.08 * r_eff) as eff
        from p
      ), c as (
        select *,
          case when tech = 'thin-film CdTe' then 100 when tech = 'thin-film CIGS' then 66
               when pmax < 220 then 36 when r_cells < 0.5 then 60 else 72 end as cells
        from s
      ), e as (
        select *, round((cells * vmp_cell)::numeric, 1)::float8 as vmp, pmax / 1000.0 / eff as area
        from c
      )
      insert into pv_module (maker, model, cell_technology, cells_in_series, pmax_w, vmp_v, imp_a, voc_v, isc_a,
        gamma_pmax_pct_per_c, beta_voc_pct_per_c, alpha_isc_pct_per_c, nominal_temp_kind, noct_c, length_mm, width_mm, mass_kg)
      select ${SCALE_MAKER_PREFIX} || ' ' || lpad((g % 60)::text, 2, '0'),
        'GM-' || lpad(g::text, 6, '0') || '-' || pmax::int,
        tech, cells, pmax, vmp,
        round((pmax / vmp)::numeric, 2)::float8,
        round((vmp * voc_over_vmp)::numeric, 1)::float8,
        round((pmax / vmp * 1.065)::numeric, 2)::float8,
        round((-0.45 + 0.2 * r_coef)::numeric, 2)::float8,
        round((-0.33 + 0.08 * r_coef)::numeric, 2)::float8,
        round((0.03 + 0.03 * r_coef)::numeric, 3)::float8,
        'noct', 42 + round((5 * r_coef)::numeric)::float8,
        round(sqrt(area * 1.65) * 1000 / 5) * 5,
        round(area * 1e6 / (round(sqrt(area * 1.65) * 1000 / 5) * 5) / 5) * 5,
        round((area * 11.5)::numeric, 1)::float8
      from e
      on conflict (maker, model) do nothing
      returning id`.execute(trx);
    const ids = inserted.rows.map((r) => r.id);
    if (!ids.length) return { moduleIds: ids, readings: 0 };

    const readingsResult = await sql`
      with m as materialized (
        select p.id, p.pmax_w, p.noct_c, p.gamma_pmax_pct_per_c as gamma, t.n, 0.78 + 0.25 * random() as field_ratio
        from unnest(${ids}::uuid[]) with ordinality as t(id, n) join pv_module p on p.id = t.id
      ), r as materialized (
        select m.*, k,
          m.pmax_w * m.field_ratio * (1 + 0.04 * (random() + random() + random() - 1.5)) as stc,
          650 + 400 * random() as g, 2 + 30 * random() as ta, random() as r_src, -40 + 100 * random() as lat,
          now() - random() * interval '730 days' as taken
        from m cross join lateral generate_series(1, case when m.n % 10 = 0 then 0 when m.n % 10 = 1 then 20 else 10 end) k
      )
      insert into field_reading (module_id, status, kind, measured_pmax_w, taken_at, latitude_deg, longitude_deg, tilt_deg, azimuth_deg,
        air_temp_c, irradiance_wm2, irradiance_source, instrument, method, cell_temp_c, stc_pmax_w, uncertainty_pct, weight, created_at)
      select id, 'approved', 'single',
        stc * g / 1000 * (1 + gamma / 100 * ((ta + (noct_c - 20) / 800 * g) - 25)),
        -- Arrays face the equator: south in the northern hemisphere, north in the southern.
        taken, lat, -120 + 270 * random(), 10 + 50 * random(),
        case when lat >= 0 then 150 + 60 * random() else mod((330 + 60 * random())::numeric, 360)::float8 end,
        ta, g,
        case when r_src < 0.5 then 'pyranometer' when r_src < 0.8 then 'reference-cell' else 'clear-sky-estimate' end,
        'generated for the benchmark', 'single reading (generated)',
        ta + (noct_c - 20) / 800 * g, stc, 3 + 5 * random(), 1, taken
      from r`.execute(trx);
    return { moduleIds: ids, readings: Number(readingsResult.numAffectedRows ?? 0) };
  });

  if (moduleIds.length) {
    await sql`
      with med as (
        select module_id, count(*) as n, percentile_cont(0.5) within group (order by stc_pmax_w) as m
        from field_reading where status = 'approved' and module_id = any(${moduleIds}::uuid[]) group by module_id
      ), mad as (
        select r.module_id, percentile_cont(0.5) within group (order by abs(r.stc_pmax_w - med.m)) as mad
        from field_reading r join med on med.module_id = r.module_id where r.status = 'approved' group by r.module_id
      )
      update pv_module p set
        verified_pmax_w = med.m,
        verified_reading_count = med.n,
        verified_spread_pct = case when med.n >= 2 then 100 * ${MAD_TO_SIGMA}::float8 * mad.mad / med.m end,
        verified_updated_at = now()
      from med join mad on mad.module_id = med.module_id
      where p.id = med.module_id`.execute(db);
    // Fresh statistics for the planner, and a visibility map so totals can come from the index alone.
    await sql`vacuum analyze pv_module`.execute(db);
    await sql`vacuum analyze field_reading`.execute(db);
  }
  log(
    `scale: ${moduleIds.length} generated modules and ${readings} approved readings in ${((Date.now() - started) / 1000).toFixed(1)} s${moduleIds.length < count ? ` (${count - moduleIds.length} were already there)` : ""}`,
  );
  return { modules: moduleIds.length, readings };
}
