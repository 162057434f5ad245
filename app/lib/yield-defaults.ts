import { VELL_HUT_SITE } from "../../data/demo/vell-valley-climate";
import type { YieldFormState } from "./yield-form";

export function defaultYieldForm(moduleId: string): YieldFormState {
  const s = VELL_HUT_SITE;
  return {
    latitudeDeg: String(s.latitudeDeg),
    longitudeDeg: String(s.longitudeDeg),
    tiltDeg: String(s.tiltDeg),
    azimuthDeg: String(s.azimuthDeg),
    albedo: String(s.albedo),
    irradianceSource: "measured",
    months: s.months.map((m) => ({
      ghi: String(m.ghiKWhM2Day),
      kt: String(m.clearnessIndex),
      tMax: String(m.tMaxC),
      tMin: String(m.tMinC),
      albedo: String(m.albedo),
    })),
    moduleId,
    powerBasis: "nameplate",
    custom: {
      pmaxW: "100",
      vmpV: "18.2",
      impA: "5.5",
      vocV: "22.1",
      iscA: "5.9",
      gammaPmaxPctPerC: "-0.40",
      betaVocPctPerC: "-0.30",
      alphaIscPctPerC: "0.05",
      noctC: "45",
    },
    controllerKind: "mppt",
    batteryVoltageV: "12",
    efficiencyPct: "97",
    soiling: "2",
    mismatch: "2",
    wiring: "1",
  };
}
