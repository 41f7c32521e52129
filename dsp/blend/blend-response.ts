import { LN_POWER_TO_DB, RAD_TO_DEG } from '../internal/angles';
import * as fastMath from '../internal/fast-math';
import { positiveFrequencies } from '../internal/guards';
import * as sectionPlan from '../internal/section-plan';
import { MAX_PATHS, SILENCE_DB, type BlendOptions, type BlendResult, type PathCurves } from './blend-types';
import { blendSpeedMps, compilePath, type CompiledPath } from './path-plan';

// Local bindings: some loaders turn imports into getter calls, which hot loops should not pay for.
const { sinCos } = fastMath;
const { evaluatePlan } = sectionPlan;

const SILENT_POWER = Math.pow(10, SILENCE_DB / 10);
const TWO_PI = 2 * Math.PI;
const INV_TWO_PI = 1 / TWO_PI;
const INV_360 = 1 / 360;

/**
 * Complex sum of up to 16 paths (filter × roll-off × gain × polarity × e^(−jωτ), τ = delayMs + distanceM/c):
 * magnitude (dB), wrapped and unwrapped phase (deg) and analytic group delay (ms) of every path and of the sum.
 * Group delay is exact: τg = −Im(H′(ω)/H(ω)) with H′ from the product rule over the analog sections.
 * @example blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [lr4High, lr4Low] }).sum.magnitudeDb[0] // ≈ 0
 */
export function blendResponse({ temperatureC, frequencyHz, paths }: BlendOptions): BlendResult {
  const speed = blendSpeedMps(temperatureC);
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  if (!Array.isArray(paths) || paths.length === 0) throw new RangeError('paths must contain at least one path');
  if (paths.length > MAX_PATHS) throw new RangeError(`paths must contain at most ${MAX_PATHS} paths (got ${paths.length})`);
  const compiled = paths.map((p, k) => compilePath(p, speed, `paths[${k}]`));
  return evaluateBlend(f, compiled);
}

/** The inner evaluation of blendResponse over a validated grid and compiled paths. */
export function evaluateBlend(f: Float64Array, compiled: readonly CompiledPath[]): BlendResult {
  const n = f.length;
  const pathCount = compiled.length;
  let tau0 = Infinity;
  for (const c of compiled) tau0 = Math.min(tau0, c.delayS);

  // One buffer for every output curve plus the scratch arrays (few large allocations instead of many small ones).
  const curves = 4 * (pathCount + 1);
  const buffer = new Float64Array(n * (curves + 6));
  const view = (k: number): Float64Array => buffer.subarray(k * n, (k + 1) * n);
  const pathCurves: PathCurves[] = compiled.map((c, k) => ({
    name: c.name,
    magnitudeDb: view(4 * k),
    phaseDeg: view(4 * k + 1),
    unwrappedPhaseDeg: view(4 * k + 2),
    groupDelayMs: view(4 * k + 3),
  }));
  const sumMag = view(4 * pathCount);
  const sumPhase = view(4 * pathCount + 1);
  const sumUnwrapped = view(4 * pathCount + 2);
  const sumGroup = view(4 * pathCount + 3);
  const omega = view(curves);
  const sr = view(curves + 1);
  const si = view(curves + 2);
  const sdr = view(curves + 3);
  const sdi = view(curves + 4);
  const sc = view(curves + 5);
  for (let i = 0; i < n; i++) omega[i] = TWO_PI * (f[i] as number);

  const scratch = new Float64Array(4);
  for (let k = 0; k < pathCount; k++) {
    const c = compiled[k] as CompiledPath;
    const plan = c.plan;
    const delta = c.delayS - tau0;
    const tau = c.delayS;
    const out = pathCurves[k] as PathCurves;
    const mag = out.magnitudeDb;
    const ph = out.phaseDeg;
    const un = out.unwrappedPhaseDeg;
    const gd = out.groupDelayMs;
    let prevWrapped = 0;
    let prevUnwrapped = 0;
    let prevGroup = 0;
    let prevOmega = 0;
    for (let i = 0; i < n; i++) {
      const w = omega[i] as number;
      evaluatePlan(plan, w, scratch);
      const hr = scratch[0] as number;
      const hi = scratch[1] as number;
      const dr = scratch[2] as number;
      const di = scratch[3] as number;
      const p = hr * hr + hi * hi;
      let phase = 0;
      if (p > SILENT_POWER) {
        mag[i] = LN_POWER_TO_DB * Math.log(p);
        phase = Math.atan2(hi, hr);
      } else {
        mag[i] = SILENCE_DB;
      }
      const group = -di;
      let unwrapped = phase;
      if (i > 0) {
        const predicted = -0.5 * (prevGroup + group) * (w - prevOmega);
        const step = phase - prevWrapped - predicted;
        unwrapped = prevUnwrapped + predicted + step - TWO_PI * Math.round(step * INV_TWO_PI);
      }
      prevWrapped = phase;
      prevUnwrapped = unwrapped;
      prevGroup = group;
      prevOmega = w;
      const delayRad = w * tau;
      const deg = RAD_TO_DEG * (phase - delayRad);
      let wrapped = deg - 360 * Math.round(deg * INV_360);
      if (wrapped <= -180) wrapped += 360;
      ph[i] = wrapped;
      un[i] = RAD_TO_DEG * (unwrapped - delayRad);
      gd[i] = 1000 * (group + tau);
      // Sum relative to the earliest path: G = H·e^(−jωΔ), G' = G·(D − jΔ).
      let gr = hr;
      let gi = hi;
      let gdi = di;
      if (delta !== 0) {
        sinCos(w * delta, sc, 0);
        const s = sc[0] as number;
        const co = sc[1] as number;
        gr = hr * co + hi * s;
        gi = hi * co - hr * s;
        gdi = di - delta;
      }
      sr[i] = (sr[i] as number) + gr;
      si[i] = (si[i] as number) + gi;
      sdr[i] = (sdr[i] as number) + gr * dr - gi * gdi;
      sdi[i] = (sdi[i] as number) + gr * gdi + gi * dr;
    }
  }
  let prevWrapped = 0;
  let prevUnwrapped = 0;
  let prevGroup = 0;
  let prevOmega = 0;
  for (let i = 0; i < n; i++) {
    const w = omega[i] as number;
    const r = sr[i] as number;
    const m = si[i] as number;
    const p = r * r + m * m;
    let phase = 0;
    let relGroup = 0;
    if (p > SILENT_POWER) {
      sumMag[i] = LN_POWER_TO_DB * Math.log(p);
      phase = Math.atan2(m, r);
      // −Im(S'/S) = −(S'_im·S_re − S'_re·S_im)/|S|²
      relGroup = -((sdi[i] as number) * r - (sdr[i] as number) * m) / p;
    } else {
      sumMag[i] = SILENCE_DB;
    }
    let unwrapped = phase;
    if (i > 0) {
      const predicted = -0.5 * (prevGroup + relGroup) * (w - prevOmega);
      const step = phase - prevWrapped - predicted;
      unwrapped = prevUnwrapped + predicted + step - TWO_PI * Math.round(step * INV_TWO_PI);
    }
    prevWrapped = phase;
    prevUnwrapped = unwrapped;
    prevGroup = relGroup;
    prevOmega = w;
    const delayRad = w * tau0;
    const deg = RAD_TO_DEG * (phase - delayRad);
    let wrapped = deg - 360 * Math.round(deg * INV_360);
    if (wrapped <= -180) wrapped += 360;
    sumPhase[i] = wrapped;
    sumUnwrapped[i] = RAD_TO_DEG * (unwrapped - delayRad);
    sumGroup[i] = p > SILENT_POWER ? 1000 * (relGroup + tau0) : 0;
  }
  return {
    frequencyHz: Float64Array.from(f),
    paths: pathCurves,
    sum: { magnitudeDb: sumMag, phaseDeg: sumPhase, unwrappedPhaseDeg: sumUnwrapped, groupDelayMs: sumGroup },
  };
}
