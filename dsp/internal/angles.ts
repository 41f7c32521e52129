/** Wraps an angle in degrees to (−180, 180]. */
export function wrapDeg(angleDeg: number): number {
  let y = angleDeg - 360 * Math.round(angleDeg / 360);
  if (y <= -180) y += 360;
  else if (y > 180) y -= 360;
  return y;
}

export const RAD_TO_DEG = 180 / Math.PI;
export const DEG_TO_RAD = Math.PI / 180;
/** 10/ln(10): converts ln(power) to dB. */
export const LN_POWER_TO_DB = 10 / Math.LN10;
