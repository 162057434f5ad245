// A per-module table of the PWM power fraction against cell temperature, so the yield loop of
// many modules avoids solving the I–V curve at every step.
import { createPwmFractionAtTemperature } from "./controller";
import type { IvKeyPoints, TemperatureCoefficients } from "./iv-model";

/**
 * Grid of the PWM fraction table, °C. Linear interpolation errs by h²/8·|f″|, about 2e-4 of
 * the fraction; where the charging voltage nears Voc (fraction low and falling as the cell warms)
 * the curve bends hard and the exact solution is used instead.
 */
export const PWM_TABLE_STEP_C = 1;

export interface PwmFractionTable {
  originC: number;
  values: Float64Array;
  exact: (cellTemperatureC: number) => number;
}

/** Below this fraction, when falling with temperature, the curve bends sharply towards Voc: the table defers to the exact solution. */
const PWM_TABLE_EXACT_BELOW = 0.5;

/**
 * The PWM fraction depends on cell temperature alone, so a module's yield loop reads it from a
 * 1 °C table over the site's range of cell temperatures, with linear interpolation, instead of
 * solving the curve at every step (ten times fewer evaluations when ranking many modules).
 */
export function tabulatePwmFraction(
  stc: IvKeyPoints,
  coefficients: TemperatureCoefficients,
  operatingVoltageV: number,
  minCellC: number,
  maxCellC: number,
): PwmFractionTable {
  const exact = createPwmFractionAtTemperature(stc, coefficients, operatingVoltageV);
  const originC = Math.floor(minCellC) - PWM_TABLE_STEP_C;
  const values = new Float64Array(Math.ceil((maxCellC - originC) / PWM_TABLE_STEP_C) + 2);
  for (let i = 0; i < values.length; i++) values[i] = exact(originC + i * PWM_TABLE_STEP_C);
  return { originC, values, exact };
}

/** Reads the table (exact solution where the fraction is low); temperatures outside it take the nearest end. */
export function pwmFractionFromTable(table: PwmFractionTable, cellTemperatureC: number): number {
  const { values } = table;
  const position = Math.min(Math.max((cellTemperatureC - table.originC) / PWM_TABLE_STEP_C, 0), values.length - 1.000001);
  const index = Math.floor(position);
  const below = values[index];
  const above = values[index + 1];
  // Falling with temperature and low: Voc is closing in on the charging voltage (sharp bend).
  if (above < below && above < PWM_TABLE_EXACT_BELOW) return table.exact(cellTemperatureC);
  return below + (above - below) * (position - index);
}
