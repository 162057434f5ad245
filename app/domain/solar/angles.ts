// Degree/radian helpers shared by the solar engine. The public API speaks degrees (the unit
// installers and the references use); trigonometry runs in radians.

export const DEG_TO_RAD = Math.PI / 180;
export const RAD_TO_DEG = 180 / Math.PI;

export function sinDeg(angleDeg: number): number {
  return Math.sin(angleDeg * DEG_TO_RAD);
}

export function cosDeg(angleDeg: number): number {
  return Math.cos(angleDeg * DEG_TO_RAD);
}

export function tanDeg(angleDeg: number): number {
  return Math.tan(angleDeg * DEG_TO_RAD);
}

/** acos in degrees, with the argument clamped to [−1, 1] so rounding never yields NaN. */
export function acosDeg(value: number): number {
  return Math.acos(clamp(value, -1, 1)) * RAD_TO_DEG;
}

export function clamp(value: number, min: number, max: number): number {
  return value < min ? min : value > max ? max : value;
}

/** Wraps a compass bearing into [0, 360). */
export function normalizeBearingDeg(bearingDeg: number): number {
  const wrapped = bearingDeg % 360;
  return wrapped < 0 ? wrapped + 360 : wrapped;
}
