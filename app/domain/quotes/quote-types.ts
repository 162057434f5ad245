// The shapes a quote is made of, shared by the editor, the customer's view and the print view.
import type { CheckKind, CheckStatus } from "../sizing/checks";
import type { SkyAssumption } from "../solar/sky-assumption";

export const QUOTE_LINE_KINDS = ["part", "labour", "mounting", "freight", "extra"] as const;
export type QuoteLineKind = (typeof QUOTE_LINE_KINDS)[number];

export const LINE_KIND_LABELS: Record<QuoteLineKind, string> = {
  part: "Kit part",
  labour: "Labour",
  mounting: "Mounting",
  freight: "Freight",
  extra: "Extra",
};

export interface SnapshotCheck {
  id: string;
  kind: CheckKind;
  status: CheckStatus;
  title: string;
  sentence: string;
  /** Set when a failing safety check was accepted with a reason on the plan. */
  override: { reason: string; byName: string } | null;
}

export interface SnapshotMonth {
  month: number;
  /** What the chosen array delivers on the month's average day, kWh. */
  arrayKWhPerDay: number;
  /** What the customer's loads use on an average day of the month, kWh. */
  loadKWhPerDay: number;
}

/** What the customer reads about the kit, copied from the plan revision the quote was priced from. */
export interface QuotePlanSnapshot {
  planName: string;
  planRevision: number;
  siteName: string;
  systemVoltageV: number;
  arrayStcPowerW: number;
  moduleCount: number;
  batteryUsableKWh: number;
  autonomyDays: number;
  months: SnapshotMonth[];
  checks: SnapshotCheck[];
  cautions: string[];
  /** The sky preset the energy rests on (null: measured irradiation); absent in snapshots saved before it was kept. */
  skyAssumption?: SkyAssumption | null;
}
