// Inputs and outputs of the monthly yield engine (the JSON of POST /api/v1/yield).
import type { ControllerSpec } from "./controller";
import type { LossKey, LossesPct } from "./losses";

export interface MonthClimate {
  /** Monthly mean daily horizontal irradiation, kWh/m²/day (installer's weather source). */
  ghiKWhM2Day?: number;
  /** Monthly mean clearness index K̄T, used when ghiKWhM2Day is absent (H = K̄T·H0). */
  clearnessIndex?: number;
  tMaxC: number;
  tMinC: number;
  /** Ground reflectance this month (snow!); overrides the site's. */
  albedo?: number;
}

export interface SiteInput {
  latitudeDeg: number;
  longitudeDeg: number;
  tiltDeg: number;
  /** Compass bearing the array faces: 0 N, 90 E, 180 S, 270 W. */
  azimuthDeg: number;
  albedo: number;
  months: MonthClimate[];
}

export interface ModuleSpec {
  pmaxW: number;
  vmpV: number;
  impA: number;
  vocV: number;
  iscA: number;
  gammaPmaxPctPerC: number;
  betaVocPctPerC: number;
  alphaIscPctPerC: number;
  noctC: number;
}

export type CellTemperatureModel = "noct" | "faiman";

export interface YieldOptions {
  cellTempModel?: CellTemperatureModel;
  /** Wind speed for the Faiman model, m/s (default 1). */
  windSpeedMs?: number;
  /** Integration step through the day, minutes (default 10). */
  stepMinutes?: number;
}

export interface YieldInput {
  site: SiteInput;
  module: ModuleSpec;
  controller: ControllerSpec;
  lossesPct: LossesPct;
  options?: YieldOptions;
}

export interface MonthlyYield {
  month: number;
  h0KWhM2Day: number;
  ghiKWhM2Day: number;
  clearnessIndex: number;
  /** "measured" when the installer gave ghiKWhM2Day, "clearness-index" when it was assumed. */
  irradianceSource: "measured" | "clearness-index";
  diffuseFraction: number;
  albedo: number;
  poaKWhM2Day: number;
  /** Irradiance-weighted mean cell temperature over daylight, °C; null when the sun never rises. */
  cellTempDaytimeC: number | null;
  /** DC energy at the maximum power point after temperature, before controller and losses. */
  dcEnergyWhPerDay: number;
  /** Loss (positive) or gain (negative) against a cell held at 25 °C. */
  temperatureLossPct: number;
  controllerLossPct: number;
  lossesWhPerDay: Record<LossKey, number>;
  /** Energy per module delivered to the battery, after temperature, controller and losses. */
  energyWhPerDay: number;
}

export interface YieldResult {
  months: MonthlyYield[];
  annualKWh: number;
  /** Month (1..12) with the lowest energyWhPerDay. */
  worstMonth: number;
  assumptions: string[];
}
