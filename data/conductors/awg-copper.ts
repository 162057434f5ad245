// American Wire Gauge copper conductors for the cable sizing.
//
// Resistance: uncoated stranded copper at 75 °C, Ω per 1000 ft, from NEC (NFPA 70) Chapter 9, Table 8
// "Conductor Properties". Rows marked "table" were read in that table (values listed in the project's
// REFERENCES); rows marked "from memory" are recalled values of the same table that could not be re-read
// here (they agree within 1 % with ρ20 = 1.7241e-8 Ω·m, α = 0.00393/K and the ~2 % stranding allowance,
// which a unit test checks).
// Area: the AWG definition (also printed in Table 8), mm².
// Ampacity: NEC Table 310.16 (formerly 310.15(B)(16)), copper, 75 °C column, not more than three
// current-carrying conductors, 30 °C ambient — FROM MEMORY; check the edition in force and derate for
// hot roofs, conduit fill and bundling.
// Largest overcurrent device: the small-conductor rule of NEC 240.4(D) (14 AWG 15 A, 12 AWG 20 A,
// 10 AWG 30 A) — FROM MEMORY; otherwise the ampacity (the "next size up" allowance of 240.4(B) is not taken).

export interface AwgCopperRow {
  /** Trade size as written: "14", "1/0"… */
  awg: string;
  areaMm2: number;
  ohmPer1000Ft75C: number;
  ampacity75CA: number;
  maxOvercurrentA: number;
  resistanceSource: "table" | "from memory";
}

export const AWG_COPPER_TABLE_SOURCE =
  "Resistance: NEC Chapter 9 Table 8, uncoated stranded copper at 75 °C. Ampacity: NEC Table 310.16, copper 75 °C column (from memory).";

export const AWG_COPPER: readonly AwgCopperRow[] = [
  { awg: "14", areaMm2: 2.08, ohmPer1000Ft75C: 3.14, ampacity75CA: 20, maxOvercurrentA: 15, resistanceSource: "table" },
  { awg: "12", areaMm2: 3.31, ohmPer1000Ft75C: 1.98, ampacity75CA: 25, maxOvercurrentA: 20, resistanceSource: "table" },
  { awg: "10", areaMm2: 5.26, ohmPer1000Ft75C: 1.24, ampacity75CA: 35, maxOvercurrentA: 30, resistanceSource: "table" },
  { awg: "8", areaMm2: 8.37, ohmPer1000Ft75C: 0.778, ampacity75CA: 50, maxOvercurrentA: 50, resistanceSource: "table" },
  { awg: "6", areaMm2: 13.3, ohmPer1000Ft75C: 0.491, ampacity75CA: 65, maxOvercurrentA: 65, resistanceSource: "table" },
  { awg: "4", areaMm2: 21.2, ohmPer1000Ft75C: 0.308, ampacity75CA: 85, maxOvercurrentA: 85, resistanceSource: "table" },
  { awg: "3", areaMm2: 26.7, ohmPer1000Ft75C: 0.245, ampacity75CA: 100, maxOvercurrentA: 100, resistanceSource: "from memory" },
  { awg: "2", areaMm2: 33.6, ohmPer1000Ft75C: 0.194, ampacity75CA: 115, maxOvercurrentA: 115, resistanceSource: "table" },
  { awg: "1", areaMm2: 42.4, ohmPer1000Ft75C: 0.154, ampacity75CA: 130, maxOvercurrentA: 130, resistanceSource: "from memory" },
  { awg: "1/0", areaMm2: 53.5, ohmPer1000Ft75C: 0.122, ampacity75CA: 150, maxOvercurrentA: 150, resistanceSource: "table" },
  { awg: "2/0", areaMm2: 67.4, ohmPer1000Ft75C: 0.0967, ampacity75CA: 175, maxOvercurrentA: 175, resistanceSource: "table" },
  { awg: "3/0", areaMm2: 85.0, ohmPer1000Ft75C: 0.0766, ampacity75CA: 200, maxOvercurrentA: 200, resistanceSource: "from memory" },
  { awg: "4/0", areaMm2: 107.2, ohmPer1000Ft75C: 0.0608, ampacity75CA: 230, maxOvercurrentA: 230, resistanceSource: "table" },
];
