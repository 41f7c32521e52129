// Polynomial atan2 and sincos, accurate to a few ulp, faster than Math.* in the inner loops.
// atan: rational approximation with range reduction after the Cephes math library (S. L. Moshier, 1984–2000).
// sin/cos: Cody–Waite reduction by π/2, then Taylor series on |r| ≤ π/4 (error < 1e-16 there).

const T3P8 = 2.414213562373095;
const MOREBITS = 6.123233995736766e-17;
const HALF_PI = Math.PI / 2;
const QUARTER_PI = Math.PI / 4;

function atanPositive(x: number): number {
  let y = 0;
  let flag = 0;
  if (x > T3P8) {
    y = HALF_PI;
    flag = 1;
    x = -1 / x;
  } else if (x > 0.66) {
    y = QUARTER_PI;
    flag = 2;
    x = (x - 1) / (x + 1);
  }
  const z = x * x;
  const p = (((-8.750608600031904e-1 * z - 1.6157537187333652e1) * z - 7.500855792314705e1) * z - 1.2288666844901362e2) * z - 6.485021904942025e1;
  const q = ((((z + 2.4858464901423062e1) * z + 1.6502700983169885e2) * z + 4.328810604912903e2) * z + 4.853903996359137e2) * z + 1.9455065714826139e2;
  let r = x + x * ((z * p) / q);
  if (flag === 2) r += 0.5 * MOREBITS;
  else if (flag === 1) r += MOREBITS;
  return y + r;
}

/** atan2(y, x) in radians, (−π, π]; atan2(0, 0) = 0. */
export function fastAtan2(y: number, x: number): number {
  if (x > 0) {
    return y >= 0 ? atanPositive(y / x) : -atanPositive(-y / x);
  }
  if (x < 0) {
    return y >= 0 ? Math.PI - atanPositive(-y / x) : atanPositive(y / x) - Math.PI;
  }
  if (y > 0) return HALF_PI;
  if (y < 0) return -HALF_PI;
  return 0;
}

const PIO2_HI = 1.5707963267341256;
const PIO2_LO = 6.077100506506192e-11;
const TWO_OVER_PI = 2 / Math.PI;

/** Writes [sin x, cos x] into out[offset], out[offset + 1]. Accurate for |x| up to about 1e6. */
export function sinCos(x: number, out: Float64Array, offset: number): void {
  if (!(Math.abs(x) < 1e6)) {
    out[offset] = Math.sin(x);
    out[offset + 1] = Math.cos(x);
    return;
  }
  const k = Math.round(x * TWO_OVER_PI);
  const r = x - k * PIO2_HI - k * PIO2_LO;
  const r2 = r * r;
  const s =
    r *
    (1 +
      r2 *
        (-1 / 6 +
          r2 * (1 / 120 + r2 * (-1 / 5040 + r2 * (1 / 362880 + r2 * (-1 / 39916800 + r2 * (1 / 6227020800 + r2 * (-1 / 1307674368000))))))));
  const c =
    1 +
    r2 *
      (-0.5 +
        r2 *
          (1 / 24 +
            r2 * (-1 / 720 + r2 * (1 / 40320 + r2 * (-1 / 3628800 + r2 * (1 / 479001600 + r2 * (-1 / 87178291200 + r2 / 20922789888000)))))));
  const quadrant = k & 3;
  if (quadrant === 0) {
    out[offset] = s;
    out[offset + 1] = c;
  } else if (quadrant === 1) {
    out[offset] = c;
    out[offset + 1] = -s;
  } else if (quadrant === 2) {
    out[offset] = -s;
    out[offset + 1] = -c;
  } else {
    out[offset] = -c;
    out[offset + 1] = s;
  }
}
