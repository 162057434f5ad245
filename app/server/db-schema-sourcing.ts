// Team-owned sourcing tables: suppliers, offers with their price breaks, the quoting currency and
// dated exchange rates. Money columns are PostgreSQL `numeric`: pg hands them over as strings and
// they are written as strings, so no amount ever passes through a JavaScript number.
import type { ColumnType, Generated, Selectable } from "kysely";

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;
/** A `numeric` column: read and written as decimal text, parsed with decimal.js. */
export type NumericText = ColumnType<string, string, string>;
/**
 * A `date` column: pg parses it into a local-midnight Date, so queries select it as `::text`; it is
 * written and compared as ISO text (YYYY-MM-DD).
 */
type DateColumn = ColumnType<Date | string, string, string>;

export type OfferPartKind = "modules" | "batteries" | "controllers" | "inverters";

export interface TeamSourcingSettingsTable {
  team_id: string;
  quoting_currency: string;
  updated_at: Timestamp;
}

export interface ExchangeRateTable {
  id: Generated<string>;
  team_id: string;
  from_currency: string;
  to_currency: string;
  rate: NumericText;
  as_of: DateColumn;
  created_by: string | null;
  created_at: Timestamp;
}

export interface SupplierTable {
  id: Generated<string>;
  team_id: string;
  name: string;
  contact: Generated<string>;
  currency: string;
  shipping_terms: Generated<string>;
  default_shipping_per_unit: ColumnType<string, string | undefined, string>;
  default_shipping_per_order: ColumnType<string, string | undefined, string>;
  default_lead_time_days: number | null;
  notes: Generated<string>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface OfferTable {
  id: Generated<string>;
  team_id: string;
  supplier_id: string;
  part_kind: OfferPartKind;
  part_id: string;
  sku: Generated<string>;
  currency: string;
  unit_price: NumericText;
  minimum_order: Generated<number>;
  shipping_per_unit: ColumnType<string, string | undefined, string>;
  shipping_per_order: ColumnType<string, string | undefined, string>;
  lead_time_days: number | null;
  stock: number | null;
  valid_until: ColumnType<Date | string | null, string | null, string | null>;
  notes: Generated<string>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface OfferPriceBreakTable {
  offer_id: string;
  min_quantity: number;
  unit_price: NumericText;
}

export interface SourcingTables {
  team_sourcing_settings: TeamSourcingSettingsTable;
  exchange_rate: ExchangeRateTable;
  supplier: SupplierTable;
  offer: OfferTable;
  offer_price_break: OfferPriceBreakTable;
}

export type Supplier = Selectable<SupplierTable>;
