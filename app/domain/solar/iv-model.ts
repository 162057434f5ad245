// Explicit four-point I–V approximation of a PV module, built from the datasheet Voc, Isc, Vmp,
// Imp without a diode model:
//   I = Isc·(1 − C1·(exp(V/(C2·Voc)) − 1)),
//   C2 = (Vmp/Voc − 1)/ln(1 − Imp/Isc),  C1 = (1 − Imp/Isc)·exp(−Vmp/(C2·Voc)).
// The form is widespread in the PV-simulation literature; its original author is not verified
// here (from memory). It gives I(0) = Isc exactly and passes close to (Vmp, Imp) and (Voc, 0).

export interface IvKeyPoints {
  vocV: number;
  iscA: number;
  vmpV: number;
  impA: number;
}

export interface ExplicitIvModel {
  iscA: number;
  vocV: number;
  c1: number;
  c2: number;
}

export function explicitIvModel(points: IvKeyPoints): ExplicitIvModel {
  const { vocV, iscA, vmpV, impA } = points;
  if (!(vocV > vmpV && vmpV > 0 && iscA > impA && impA > 0)) {
    throw new RangeError("I–V key points need 0 < Vmp < Voc and 0 < Imp < Isc");
  }
  const c2 = (vmpV / vocV - 1) / Math.log(1 - impA / iscA);
  const c1 = (1 - impA / iscA) * Math.exp(-vmpV / (c2 * vocV));
  return { iscA, vocV, c1, c2 };
}

/** Current at a terminal voltage, never negative (a module does not sink current here). */
export function currentAtVoltageA(model: ExplicitIvModel, voltageV: number): number {
  if (voltageV <= 0) return model.iscA;
  const current = model.iscA * (1 - model.c1 * (Math.exp(voltageV / (model.c2 * model.vocV)) - 1));
  return Math.max(0, current);
}

/** Temperature coefficients as fractions per °C (datasheet %/°C divided by 100). */
export interface TemperatureCoefficients {
  alphaIscPerC: number;
  betaVocPerC: number;
  gammaPmaxPerC: number;
}

/**
 * Moves the STC key points to an irradiance and cell temperature. Currents scale with G/1000 and
 * (1 + αΔT); Voc with (1 + βΔT). Vmp is shifted by (1 + γΔT)/(1 + αΔT) so that Vmp·Imp follows
 * the datasheet's Pmax coefficient γ exactly — the same power the MPPT path uses. The small
 * logarithmic fall of voltage at low irradiance is ignored.
 */
export function translateKeyPoints(stc: IvKeyPoints, coefficients: TemperatureCoefficients, irradianceWm2: number, cellTemperatureC: number): IvKeyPoints {
  const deltaTC = cellTemperatureC - 25;
  const currentFactor = (irradianceWm2 / 1000) * (1 + coefficients.alphaIscPerC * deltaTC);
  const vocV = stc.vocV * (1 + coefficients.betaVocPerC * deltaTC);
  const vmpV = Math.min((stc.vmpV * (1 + coefficients.gammaPmaxPerC * deltaTC)) / (1 + coefficients.alphaIscPerC * deltaTC), 0.98 * vocV);
  return { vocV, iscA: stc.iscA * currentFactor, vmpV, impA: stc.impA * currentFactor };
}

/**
 * x = V/(C2·Voc) at the model's maximum power point. Setting dP/dV = 0 for P = V·I(V) gives
 * e^x·(1 + x) = (1 + C1)/C1; Newton's method on its logarithm, ln(1 + x) + x = L with
 * L = ln((1 + C1)/C1), started one fixed-point step in (x = L − ln(1 + L)), converges in two or
 * three steps.
 */
export function maximumPowerExponent(c1: number): number {
  const target = Math.log((1 + c1) / c1);
  let x = target - Math.log(1 + target);
  for (let i = 0; i < 8; i++) {
    const step = ((Math.log(1 + x) + x - target) * (1 + x)) / (2 + x);
    x -= step;
    if (Math.abs(step) < 1e-10 * x) break;
  }
  return x;
}

/** The model curve's own maximum power point: P = Vmp·Isc·(1 + C1)·x/(1 + x) at Vmp = x·C2·Voc. */
export function modelMaximumPowerW(model: ExplicitIvModel): { pmaxW: number; vmpV: number } {
  const x = maximumPowerExponent(model.c1);
  const vmpV = x * model.c2 * model.vocV;
  return { pmaxW: (vmpV * model.iscA * (1 + model.c1) * x) / (1 + x), vmpV };
}
