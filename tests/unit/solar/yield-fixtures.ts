// Shared invented inputs for the yield tests (no real product or site data). Irradiation and
// albedo follow Duffie & Beckman Example 2.19.1 (Madison, 43°N); temperatures are invented.
import type { ModuleSpec, SiteInput } from "~/domain/solar/yield-types";

export const MADISON_H_MJ = [6.44, 9.89, 12.86, 16.05, 21.36, 23.04, 22.58, 20.33, 14.59, 10.48, 6.37, 5.74];
export const MADISON_ALBEDO = [0.7, 0.7, 0.4, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.4];
export const MADISON_HT_MJ = [13.7, 17.2, 15.8, 14.7, 16.6, 16.5, 16.8, 17.5, 15.6, 15.2, 11.4, 12.7];
const T_MAX_C = [-4, -1, 5, 13, 20, 25, 28, 26, 21, 15, 6, -2];
const T_MIN_C = [-13, -11, -4, 2, 8, 13, 16, 15, 10, 4, -3, -10];

export function madisonSite(): SiteInput {
  return {
    latitudeDeg: 43,
    longitudeDeg: -89.4,
    tiltDeg: 60,
    azimuthDeg: 180,
    albedo: 0.2,
    months: MADISON_H_MJ.map((hMJ, i) => ({ ghiKWhM2Day: hMJ / 3.6, tMaxC: T_MAX_C[i], tMinC: T_MIN_C[i], albedo: MADISON_ALBEDO[i] })),
  };
}

export const TEST_MODULE: ModuleSpec = {
  pmaxW: 100,
  vmpV: 18.2,
  impA: 5.5,
  vocV: 22.1,
  iscA: 5.9,
  gammaPmaxPctPerC: -0.4,
  betaVocPctPerC: -0.3,
  alphaIscPctPerC: 0.05,
  noctC: 45,
};

export const TEST_LOSSES = { soiling: 2, mismatch: 2, wiring: 1 };
export const MPPT_12V = { kind: "mppt" as const, batteryVoltageV: 12, efficiencyPct: 97 };
export const PWM_12V = { kind: "pwm" as const, batteryVoltageV: 12, efficiencyPct: 97 };
