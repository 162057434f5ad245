// Team-owned planning tables: sites and load sheets (and, later, kit plans).
import type { ColumnType, Generated, Selectable } from "kysely";
import type { Appliance } from "~/domain/load/load-sheet-types";

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

export interface PlanningTables {
  site: SiteTable;
  load_sheet: LoadSheetTable;
}

export type Site = Selectable<SiteTable>;
export type LoadSheet = Selectable<LoadSheetTable>;
