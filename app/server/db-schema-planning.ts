// Team-owned planning tables: sites and load sheets (and, later, kit plans).
import type { ColumnType, Generated, Selectable } from "kysely";
import type { Appliance } from "~/domain/load/load-sheet-types";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import type { PlanChoicesJson } from "~/lib/plan-choices";

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;
type Json<T> = ColumnType<T, string, string>;

export interface SiteMonthJson {
  ghiKWhM2Day?: number;
  clearnessIndex?: number;
  tMaxC: number;
  tMinC: number;
  albedo?: number;
}

export interface SiteTable {
  id: Generated<string>;
  team_id: string;
  name: string;
  customer_name: string;
  customer_email: string | null;
  customer_phone: string | null;
  latitude_deg: number;
  longitude_deg: number;
  elevation_m: Generated<number>;
  time_zone: string;
  tilt_deg: number;
  azimuth_deg: number;
  albedo: number;
  shading_derate_pct: Generated<number>;
  coldest_temp_c: number;
  /** The hottest afternoon designed for, °C; null: the hottest month's mean daily maximum stands in. */
  hottest_temp_c: number | null;
  irradiance_source: "measured" | "clearness-preset";
  clearness_preset: string | null;
  months: Json<SiteMonthJson[]>;
  notes: Generated<string>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

/** Stored as the load domain's own appliance shape (app/domain/load/load-sheet-types.ts). */
export type ApplianceJson = Appliance;

export interface LoadSheetTable {
  id: Generated<string>;
  team_id: string;
  site_id: string;
  name: string;
  appliances: Json<ApplianceJson[]>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface KitPlanTable {
  id: Generated<string>;
  team_id: string;
  site_id: string;
  load_sheet_id: string | null;
  name: string;
  latest_revision: Generated<number>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface PlanOverrideJson {
  checkId: string;
  reason: string;
  byUserId: string;
  byName: string;
  at: string;
}

export interface KitPlanRevisionTable {
  id: Generated<string>;
  plan_id: string;
  revision: number;
  choices: Json<PlanChoicesJson>;
  inputs: Json<KitPlanInput>;
  result: Json<KitPlan>;
  failing_safety_checks: number;
  overrides: ColumnType<PlanOverrideJson[], string | undefined, string>;
  note: Generated<string>;
  created_by: string | null;
  created_at: Timestamp;
}

export interface PlanningTables {
  site: SiteTable;
  load_sheet: LoadSheetTable;
  kit_plan: KitPlanTable;
  kit_plan_revision: KitPlanRevisionTable;
}

export type Site = Selectable<SiteTable>;
export type LoadSheet = Selectable<LoadSheetTable>;
