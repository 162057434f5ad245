// The catalogue figures a comparison needs, read straight from the shared catalogue tables. An offer
// may name a module that a curator later merged into another: the figures then come from the model
// that stayed (it holds the readings), so the offer keeps counting.
import type { Executor } from "./executor.server";
import type { BatteryFigures, ControllerFigures, InverterFigures, ModuleFigures, OfferPartKind, PartFiguresByKind } from "~/domain/sourcing/offer-facts";

export const PART_TABLE = { modules: "pv_module", batteries: "battery", controllers: "charge_controller", inverters: "inverter" } as const;

/** Follows merged_into (at most a few hops) to the part that stayed; maps each asked id to it. */
async function survivors(db: Executor, kind: OfferPartKind, ids: readonly string[]) {
  const result = new Map<string, string>();
  let pending = [...new Set(ids)].map((id) => ({ asked: id, current: id }));
  for (let hop = 0; hop < 5 && pending.length; hop++) {
    const rows = await db
      .selectFrom(PART_TABLE[kind] as "battery")
      .select(["id", "merged_into"])
      .where("id", "in", [...new Set(pending.map((p) => p.current))])
      .execute();
    const mergedInto = new Map(rows.map((r) => [r.id, r.merged_into]));
    const next: typeof pending = [];
    for (const p of pending) {
      if (!mergedInto.has(p.current)) continue; // part gone: no figures
      const target = mergedInto.get(p.current);
      if (target) next.push({ asked: p.asked, current: target });
      else result.set(p.asked, p.current);
    }
    pending = next;
  }
  return result;
}

async function figuresFor<K extends OfferPartKind>(
  db: Executor,
  kind: K,
  ids: readonly string[],
  load: (db: Executor, ids: string[]) => Promise<PartFiguresByKind[K][]>,
) {
  const byAsked = new Map<string, PartFiguresByKind[K]>();
  if (!ids.length) return byAsked;
  const stayed = await survivors(db, kind, ids);
  const targets = [...new Set(stayed.values())];
  const figures = new Map((targets.length ? await load(db, targets) : []).map((f) => [f.id, f]));
  for (const [asked, target] of stayed) {
    const f = figures.get(target);
    if (f) byAsked.set(asked, f);
  }
  return byAsked;
}

function loadModules(db: Executor, ids: string[]): Promise<ModuleFigures[]> {
  return db
    .selectFrom("pv_module")
    .select([
      "id",
      "maker",
      "model",
      "pmax_w as pmaxW",
      "verified_pmax_w as verifiedPmaxW",
      "verified_reading_count as verifiedReadingCount",
      "verified_ratio as verifiedRatio",
      "area_m2 as areaM2",
      "nameplate_density_wm2 as nameplateDensityWm2",
      "measured_density_wm2 as measuredDensityWm2",
    ])
    .where("id", "in", ids)
    .execute();
}

function loadBatteries(db: Executor, ids: string[]): Promise<BatteryFigures[]> {
  return db
    .selectFrom("battery")
    .select([
      "id",
      "maker",
      "model",
      "chemistry",
      "nominal_voltage_v as nominalVoltageV",
      "capacity_ah as capacityAh",
      "capacity_hour_rate_h as capacityHourRateH",
      "usable_dod_pct as usableDodPct",
      "cycle_life as cycleLife",
      "round_trip_efficiency_pct as roundTripEfficiencyPct",
    ])
    .where("id", "in", ids)
    .execute();
}

function loadControllers(db: Executor, ids: string[]): Promise<ControllerFigures[]> {
  return db
    .selectFrom("charge_controller")
    .select([
      "id",
      "maker",
      "model",
      "kind",
      "battery_voltages_v as batteryVoltagesV",
      "max_pv_voc_v as maxPvVocV",
      "max_charge_current_a as maxChargeCurrentA",
      "max_pv_power_w as maxPvPowerW",
    ])
    .where("id", "in", ids)
    .execute();
}

function loadInverters(db: Executor, ids: string[]): Promise<InverterFigures[]> {
  return db
    .selectFrom("inverter")
    .select([
      "id",
      "maker",
      "model",
      "continuous_w as continuousW",
      "surge_w as surgeW",
      "dc_input_voltage_v as dcInputVoltageV",
      "efficiency_pct as efficiencyPct",
      "idle_draw_w as idleDrawW",
    ])
    .where("id", "in", ids)
    .execute();
}

const LOADERS: { [K in OfferPartKind]: (db: Executor, ids: string[]) => Promise<PartFiguresByKind[K][]> } = {
  modules: loadModules,
  batteries: loadBatteries,
  controllers: loadControllers,
  inverters: loadInverters,
};

/** Figures of the given parts of one kind, keyed by the id asked for (merged models resolved). */
export function loadPartFigures<K extends OfferPartKind>(db: Executor, kind: K, ids: readonly string[]) {
  return figuresFor(db, kind, ids, LOADERS[kind] as (db: Executor, ids: string[]) => Promise<PartFiguresByKind[K][]>);
}

export interface PartChoice {
  id: string;
  maker: string;
  model: string;
}

/** Parts a new offer can name: every model of the kind that was not merged away. */
export function listPartChoices(db: Executor, kind: OfferPartKind): Promise<PartChoice[]> {
  return db
    .selectFrom(PART_TABLE[kind] as "battery")
    .select(["id", "maker", "model"])
    .where("merged_into", "is", null)
    .orderBy("maker")
    .orderBy("model")
    .execute();
}

/** One part's maker and model (merged or not), or undefined. */
export function findPart(db: Executor, kind: OfferPartKind, id: string) {
  return db
    .selectFrom(PART_TABLE[kind] as "battery")
    .select(["id", "maker", "model", "merged_into"])
    .where("id", "=", id)
    .executeTakeFirst();
}
