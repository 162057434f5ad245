// The demo's three customers of Tallowmere Power Works in the fictional Vell Valley, with invented
// climates and loads (made up for the demo; not measured anywhere).
import type { LoadSheetInput } from "../../app/lib/load-sheet-forms";
import type { SiteForm } from "../../app/lib/site-forms";
import { VELL_HUT_SITE } from "./vell-valley-climate";

export interface DemoSite {
  site: SiteForm;
  loadSheet: LoadSheetInput;
  plan: { name: string; systemVoltageV: 12 | 24 | 48; module: string; controller: string; battery: string; inverter: string | null };
}

const WINTER = [1, 2, 3, 10, 11, 12];
const SUMMER = [4, 5, 6, 7, 8, 9];

export const DEMO_SITES: DemoSite[] = [
  {
    site: {
      name: "Vell Ridge mountain hut",
      customerName: "Aurel Stroud (hut warden)",
      customerEmail: "warden@vell-hut.example",
      latitudeDeg: VELL_HUT_SITE.latitudeDeg,
      longitudeDeg: VELL_HUT_SITE.longitudeDeg,
      elevationM: 2140,
      timeZone: "Europe/Vienna",
      tiltDeg: 55,
      azimuthDeg: 180,
      albedo: 0.2,
      shadingDeratePct: 3,
      coldestTempC: -24,
      hottestTempC: 26,
      irradianceSource: "measured",
      months: VELL_HUT_SITE.months.map(({ ghiKWhM2Day, tMaxC, tMinC, albedo }) => ({ ghiKWhM2Day, tMaxC, tMinC, albedo })),
      notes: "Roof faces due south; snow slides off above 50° tilt.",
    },
    loadSheet: {
      name: "Hut, all seasons",
      appliances: [
        { name: "Chest fridge (DC)", powerW: 55, quantity: 1, hoursPerDay: 9, daysPerWeek: 7, circuit: "dc", surgeW: 160 },
        { name: "LED lights", powerW: 7, quantity: 8, hoursPerDay: 5, daysPerWeek: 7, circuit: "dc", months: WINTER },
        { name: "LED lights", powerW: 7, quantity: 8, hoursPerDay: 3, daysPerWeek: 7, circuit: "dc", months: SUMMER },
        { name: "Radio repeater", powerW: 12, quantity: 1, hoursPerDay: 24, daysPerWeek: 7, circuit: "dc" },
        { name: "Water pump", powerW: 350, quantity: 1, hoursPerDay: 0.5, daysPerWeek: 7, circuit: "ac", surgeW: 1050 },
        { name: "Laptop charging", powerW: 65, quantity: 2, hoursPerDay: 3, daysPerWeek: 5, circuit: "ac" },
      ],
    },
    plan: {
      name: "Hut kit, 24 V lithium",
      systemVoltageV: 24,
      module: "Fellmark Solar FM-380H",
      controller: "Amberlow Electric AE-MPPT60",
      battery: "Wickfold Power WP-LFP24-200",
      inverter: "Amberlow Electric AE-SW2000-24",
    },
  },
  {
    site: {
      name: "Brackwater orchard pump",
      customerName: "Brackwater growers' co-operative",
      latitudeDeg: 45.9,
      longitudeDeg: 10.3,
      elevationM: 310,
      timeZone: "Europe/Vienna",
      tiltDeg: 25,
      azimuthDeg: 190,
      albedo: 0.22,
      shadingDeratePct: 0,
      coldestTempC: -9,
      hottestTempC: 38,
      irradianceSource: "clearness-preset",
      clearnessPreset: "arid",
      months: [4, 7, 12, 17, 22, 27, 30, 29, 24, 18, 10, 5].map((tMaxC) => ({ tMaxC, tMinC: tMaxC - 11 })),
      notes: "Pump runs only in the growing season; array on the pump-house roof.",
    },
    loadSheet: {
      name: "Irrigation season",
      appliances: [
        {
          name: "Borehole pump (DC, brushless)",
          powerW: 600,
          quantity: 1,
          hoursPerDay: 5,
          daysPerWeek: 7,
          circuit: "dc",
          surgeW: 900,
          months: [4, 5, 6, 7, 8, 9],
        },
        { name: "Telemetry unit", powerW: 4, quantity: 1, hoursPerDay: 24, daysPerWeek: 7, circuit: "dc" },
      ],
    },
    plan: {
      name: "Pump kit, 48 V",
      systemVoltageV: 48,
      module: "Harrowgate Cells HG-415T108",
      controller: "Amberlow Electric AE-MPPT60",
      battery: "Wickfold Power WP-LFP48-100",
      inverter: null,
    },
  },
  {
    site: {
      name: "Fenmoor ranger station",
      customerName: "Vell Valley rangers",
      latitudeDeg: 46.8,
      longitudeDeg: 9.1,
      elevationM: 980,
      timeZone: "Europe/Vienna",
      tiltDeg: 50,
      azimuthDeg: 165,
      albedo: 0.2,
      shadingDeratePct: 8,
      coldestTempC: -18,
      hottestTempC: 32,
      irradianceSource: "clearness-preset",
      clearnessPreset: "temperate",
      months: [1, 3, 8, 13, 18, 22, 24, 23, 19, 13, 6, 2].map((tMaxC) => ({ tMaxC, tMinC: tMaxC - 8 })),
    },
    loadSheet: {
      name: "Station, staffed weekdays",
      appliances: [
        { name: "Radio base station", powerW: 25, quantity: 1, hoursPerDay: 24, daysPerWeek: 7, circuit: "dc" },
        { name: "Fridge (AC)", powerW: 90, quantity: 1, hoursPerDay: 8, daysPerWeek: 7, circuit: "ac", surgeW: 450 },
        { name: "Computer and printer", powerW: 120, quantity: 1, hoursPerDay: 6, daysPerWeek: 5, circuit: "ac" },
        { name: "Lights", powerW: 9, quantity: 10, hoursPerDay: 4, daysPerWeek: 7, circuit: "dc" },
      ],
    },
    plan: {
      name: "Station kit, 24 V AGM",
      systemVoltageV: 24,
      module: "Quillon Photonics QP-330P60",
      controller: "Amberlow Electric AE-MPPT60",
      battery: "Korrowdale Storage KS-200GEL",
      inverter: "Amberlow Electric AE-SW2000-24",
    },
  },
];
