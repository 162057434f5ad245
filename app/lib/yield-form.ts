// The yield page's editable state and its conversion to the POST /api/v1/yield body.
export interface MonthRow {
  ghi: string;
  kt: string;
  tMax: string;
  tMin: string;
  albedo: string;
}

export interface YieldFormState {
  latitudeDeg: string;
  longitudeDeg: string;
  tiltDeg: string;
  azimuthDeg: string;
  albedo: string;
  irradianceSource: "measured" | "clearness-index";
  months: MonthRow[];
  moduleId: string; // "" = custom figures below
  powerBasis: "nameplate" | "verified";
  custom: {
    pmaxW: string;
    vmpV: string;
    impA: string;
    vocV: string;
    iscA: string;
    gammaPmaxPctPerC: string;
    betaVocPctPerC: string;
    alphaIscPctPerC: string;
    noctC: string;
  };
  controllerKind: "mppt" | "pwm";
  batteryVoltageV: string;
  efficiencyPct: string;
  soiling: string;
  mismatch: string;
  wiring: string;
}

export const MONTH_NAMES = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** Empty text stays empty (the API then says the field is missing) instead of becoming 0. */
function num(text: string): number | string {
  const trimmed = text.trim();
  if (trimmed === "") return "";
  const value = Number(trimmed.replace(",", "."));
  return Number.isFinite(value) ? value : trimmed;
}

export function toRequestBody(state: YieldFormState) {
  const c = state.custom;
  return {
    site: {
      latitudeDeg: num(state.latitudeDeg),
      longitudeDeg: num(state.longitudeDeg),
      tiltDeg: num(state.tiltDeg),
      azimuthDeg: num(state.azimuthDeg),
      albedo: num(state.albedo),
      months: state.months.map((m) => ({
        ...(state.irradianceSource === "measured" ? { ghiKWhM2Day: num(m.ghi) } : { clearnessIndex: num(m.kt) }),
        tMaxC: num(m.tMax),
        tMinC: num(m.tMin),
        ...(m.albedo.trim() ? { albedo: num(m.albedo) } : {}),
      })),
    },
    module: state.moduleId
      ? { moduleId: state.moduleId }
      : {
          pmaxW: num(c.pmaxW),
          vmpV: num(c.vmpV),
          impA: num(c.impA),
          vocV: num(c.vocV),
          iscA: num(c.iscA),
          gammaPmaxPctPerC: num(c.gammaPmaxPctPerC),
          betaVocPctPerC: num(c.betaVocPctPerC),
          alphaIscPctPerC: num(c.alphaIscPctPerC),
          noctC: num(c.noctC),
        },
    ...(state.moduleId ? { powerBasis: state.powerBasis } : {}),
    controller: { kind: state.controllerKind, batteryVoltageV: num(state.batteryVoltageV), efficiencyPct: num(state.efficiencyPct) },
    lossesPct: { soiling: num(state.soiling), mismatch: num(state.mismatch), wiring: num(state.wiring) },
  };
}
