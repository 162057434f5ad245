// Invented field readings for the demo catalogue (Vell Valley, fictional; UTC+1 all year). Each
// line says what the module "really" delivers (stcRatio, a share of nameplate) and the conditions
// of the day; scripts/lib/seed-readings.ts draws a sweep or a single reading to match and lets the
// engine normalise it, exactly as a submitted reading is. Budget poly modules verify at 80–90 %
// of nameplate; the HJT module beats its nameplate on cold, clear late-winter days.
export interface DemoReading {
  maker: string;
  model: string;
  submitter: string;
  status: "approved" | "rejected" | "pending";
  reason?: string;
  kind: "sweep" | "single";
  /** Local time at UTC+1. */
  takenAtLocal: string;
  stcRatio: number;
  tiltDeg: number;
  azimuthDeg: number;
  airTempC: number;
  backSheetC: number | null;
  irradiance: { source: "pyranometer" | "reference-cell"; wm2: number } | { source: "clear-sky-estimate" };
  instrument: string;
  method: string;
}

export const VELL_READING_PLACE = { latitudeDeg: 46.41, longitudeDeg: 9.83, utcOffsetH: 1 };

const LOAD = "Invented EL-150 electronic load with logging";
const PYRANOMETER = `${LOAD}; thermopile pyranometer in plane; contact thermometer on the back sheet`;
const REF_CELL = `${LOAD}; reference cell in plane; contact thermometer on the back sheet`;
const RACK = "Module on an open test rack at the workshop, cleaned, sweep from short to open circuit in about one second.";
const ROOF = "Module on the customer's roof mount, connected alone through its own leads; quick sweep from short to open circuit.";

export const DEMO_READINGS: DemoReading[] = [
  // Quillon Photonics QP-150P: a budget module at about 84 % of nameplate.
  { maker: "Quillon Photonics", model: "QP-150P", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-05-20T12:40", stcRatio: 0.835, tiltDeg: 35, azimuthDeg: 180, airTempC: 17, backSheetC: 41, irradiance: { source: "pyranometer", wm2: 910 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Quillon Photonics", model: "QP-150P", submitter: "tobin@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-07-08T13:15", stcRatio: 0.845, tiltDeg: 30, azimuthDeg: 190, airTempC: 24, backSheetC: 47, irradiance: { source: "reference-cell", wm2: 870 }, instrument: REF_CELL, method: ROOF },
  { maker: "Quillon Photonics", model: "QP-150P", submitter: "sefa@brindlecombe.example", status: "approved", kind: "single", takenAtLocal: "2026-08-02T12:05", stcRatio: 0.83, tiltDeg: 25, azimuthDeg: 175, airTempC: 22, backSheetC: 45, irradiance: { source: "pyranometer", wm2: 960 }, instrument: "Invented MPPT tracer display and clamp meter; pyranometer; thermometer", method: "Read at the tracker's maximum power point after it settled for a minute." },
  { maker: "Quillon Photonics", model: "QP-150P", submitter: "sefa@brindlecombe.example", status: "approved", kind: "sweep", takenAtLocal: "2026-09-12T12:30", stcRatio: 0.86, tiltDeg: 40, azimuthDeg: 180, airTempC: 16, backSheetC: null, irradiance: { source: "clear-sky-estimate" }, instrument: LOAD, method: "Cloudless noon, no irradiance meter to hand. " + RACK },
  { maker: "Quillon Photonics", model: "QP-150P", submitter: "tobin@tallowmere.example", status: "rejected", reason: "The photo shows the shadow of the railing across two cells; please measure again in full sun.", kind: "sweep", takenAtLocal: "2026-06-03T14:20", stcRatio: 0.58, tiltDeg: 30, azimuthDeg: 200, airTempC: 23, backSheetC: 44, irradiance: { source: "pyranometer", wm2: 880 }, instrument: PYRANOMETER, method: ROOF },
  { maker: "Quillon Photonics", model: "QP-150P", submitter: "maren@tallowmere.example", status: "pending", kind: "sweep", takenAtLocal: "2026-11-24T12:25", stcRatio: 1.09, tiltDeg: 50, azimuthDeg: 180, airTempC: 4, backSheetC: 19, irradiance: { source: "reference-cell", wm2: 820 }, instrument: REF_CELL, method: "New batch from a different supplier. " + RACK },

  // Fellmark Solar FM-120M: a good mono module at about 99 %.
  { maker: "Fellmark Solar", model: "FM-120M", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-06-21T12:50", stcRatio: 0.99, tiltDeg: 30, azimuthDeg: 180, airTempC: 25, backSheetC: 49, irradiance: { source: "pyranometer", wm2: 985 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Fellmark Solar", model: "FM-120M", submitter: "sefa@brindlecombe.example", status: "approved", kind: "sweep", takenAtLocal: "2026-07-30T12:10", stcRatio: 0.985, tiltDeg: 35, azimuthDeg: 170, airTempC: 27, backSheetC: 51, irradiance: { source: "reference-cell", wm2: 940 }, instrument: REF_CELL, method: ROOF },
  { maker: "Fellmark Solar", model: "FM-120M", submitter: "tobin@tallowmere.example", status: "approved", kind: "single", takenAtLocal: "2026-09-01T12:35", stcRatio: 1.0, tiltDeg: 35, azimuthDeg: 180, airTempC: 19, backSheetC: 42, irradiance: { source: "pyranometer", wm2: 920 }, instrument: "Invented MPPT tracer display; pyranometer; thermometer", method: "Tracker's reading at the maximum power point, module alone on the rack." },
  { maker: "Fellmark Solar", model: "FM-120M", submitter: "tobin@tallowmere.example", status: "pending", kind: "sweep", takenAtLocal: "2026-10-20T09:10", stcRatio: 0.97, tiltDeg: 35, azimuthDeg: 180, airTempC: 6, backSheetC: 14, irradiance: { source: "pyranometer", wm2: 480 }, instrument: PYRANOMETER, method: "Early reading before driving to the pump site. " + RACK },

  // Quillon Photonics QP-60P and QP-330P60: more budget poly, 86 % and 88 %.
  { maker: "Quillon Photonics", model: "QP-60P", submitter: "sefa@brindlecombe.example", status: "approved", kind: "sweep", takenAtLocal: "2026-05-11T12:20", stcRatio: 0.85, tiltDeg: 35, azimuthDeg: 180, airTempC: 15, backSheetC: 38, irradiance: { source: "pyranometer", wm2: 900 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Quillon Photonics", model: "QP-60P", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-06-09T13:00", stcRatio: 0.87, tiltDeg: 30, azimuthDeg: 185, airTempC: 22, backSheetC: 46, irradiance: { source: "pyranometer", wm2: 950 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Quillon Photonics", model: "QP-60P", submitter: "tobin@tallowmere.example", status: "approved", kind: "single", takenAtLocal: "2026-08-18T12:45", stcRatio: 0.86, tiltDeg: 30, azimuthDeg: 180, airTempC: 26, backSheetC: 50, irradiance: { source: "reference-cell", wm2: 930 }, instrument: "Invented MPPT tracer display; reference cell; thermometer", method: "Tracker's reading at the maximum power point." },
  { maker: "Quillon Photonics", model: "QP-330P60", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-04-28T12:30", stcRatio: 0.88, tiltDeg: 40, azimuthDeg: 180, airTempC: 12, backSheetC: 35, irradiance: { source: "pyranometer", wm2: 970 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Quillon Photonics", model: "QP-330P60", submitter: "sefa@brindlecombe.example", status: "approved", kind: "sweep", takenAtLocal: "2026-07-14T12:55", stcRatio: 0.875, tiltDeg: 25, azimuthDeg: 195, airTempC: 28, backSheetC: 53, irradiance: { source: "reference-cell", wm2: 960 }, instrument: REF_CELL, method: ROOF },
  { maker: "Quillon Photonics", model: "QP-330P60", submitter: "tobin@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-09-25T12:15", stcRatio: 0.89, tiltDeg: 45, azimuthDeg: 180, airTempC: 14, backSheetC: 36, irradiance: { source: "pyranometer", wm2: 900 }, instrument: PYRANOMETER, method: RACK },

  // Harrowgate Cells HG-100M36 at about 97 %; Cinderbrook CB-90F at nameplate.
  { maker: "Harrowgate Cells", model: "HG-100M36", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-05-02T12:35", stcRatio: 0.97, tiltDeg: 35, azimuthDeg: 180, airTempC: 14, backSheetC: 37, irradiance: { source: "pyranometer", wm2: 940 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Harrowgate Cells", model: "HG-100M36", submitter: "sefa@brindlecombe.example", status: "approved", kind: "sweep", takenAtLocal: "2026-08-11T13:05", stcRatio: 0.965, tiltDeg: 30, azimuthDeg: 180, airTempC: 25, backSheetC: 49, irradiance: { source: "reference-cell", wm2: 915 }, instrument: REF_CELL, method: ROOF },
  { maker: "Harrowgate Cells", model: "HG-100M36", submitter: "tobin@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-09-19T12:25", stcRatio: 0.975, tiltDeg: 40, azimuthDeg: 180, airTempC: 17, backSheetC: 39, irradiance: { source: "pyranometer", wm2: 925 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Cinderbrook", model: "CB-90F", submitter: "sefa@brindlecombe.example", status: "approved", kind: "sweep", takenAtLocal: "2026-06-16T12:40", stcRatio: 0.99, tiltDeg: 30, azimuthDeg: 180, airTempC: 23, backSheetC: 46, irradiance: { source: "pyranometer", wm2: 960 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Cinderbrook", model: "CB-90F", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-08-25T12:20", stcRatio: 1.0, tiltDeg: 35, azimuthDeg: 185, airTempC: 21, backSheetC: 44, irradiance: { source: "reference-cell", wm2: 930 }, instrument: REF_CELL, method: RACK },

  // Fellmark Solar FM-380H: measured above its 380 W nameplate on cold, clear days over snow.
  { maker: "Fellmark Solar", model: "FM-380H", submitter: "maren@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-03-05T12:20", stcRatio: 1.015, tiltDeg: 55, azimuthDeg: 180, airTempC: -6, backSheetC: 6, irradiance: { source: "pyranometer", wm2: 1040 }, instrument: PYRANOMETER, method: "Cold, clear morning after snowfall; module on the hut's wall rack, snow all around. " + RACK },
  { maker: "Fellmark Solar", model: "FM-380H", submitter: "tobin@tallowmere.example", status: "approved", kind: "sweep", takenAtLocal: "2026-03-19T12:30", stcRatio: 1.02, tiltDeg: 55, azimuthDeg: 180, airTempC: -2, backSheetC: 9, irradiance: { source: "pyranometer", wm2: 1010 }, instrument: PYRANOMETER, method: "Clear, cold day with snow on the ground. " + RACK },

  // Waiting for the curator.
  { maker: "Harrowgate Cells", model: "HG-200M36", submitter: "tobin@tallowmere.example", status: "pending", kind: "sweep", takenAtLocal: "2026-10-02T12:30", stcRatio: 0.955, tiltDeg: 45, azimuthDeg: 180, airTempC: 14, backSheetC: 34, irradiance: { source: "pyranometer", wm2: 880 }, instrument: PYRANOMETER, method: RACK },
  { maker: "Harrowgate Cells", model: "HG-415T108", submitter: "maren@tallowmere.example", status: "pending", kind: "single", takenAtLocal: "2026-11-18T12:15", stcRatio: 0.97, tiltDeg: 45, azimuthDeg: 175, airTempC: 7, backSheetC: null, irradiance: { source: "clear-sky-estimate" }, instrument: "Invented MPPT controller display", method: "Read off the controller at the ranger station after the array settled; no irradiance meter on site." },
];
