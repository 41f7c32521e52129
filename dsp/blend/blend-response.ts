import { LN_POWER_TO_DB, RAD_TO_DEG } from '../internal/angles';
import * as fastMath from '../internal/fast-math';
import { positiveFrequencies } from '../internal/guards';
import * as sectionPlan from '../internal/section-plan';
import { MAX_PATHS, SILENCE_DB, type BlendOptions, type BlendResult, type PathCurves } from './blend-types';
import { blendSpeedMps, compilePath, type CompiledPath } from './path-plan';

// Local bindings: some loaders turn imports into getter calls, which hot loops should not pay for.
const { fastAtan2, sinCos, wrapRad } = fastMath;
const { evaluatePlan } = sectionPlan;

const SILENT_POWER = Math.pow(10, SILENCE_DB / 10);
const TWO_PI = 2 * Math.PI;

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
  const relDelay = new Float64Array(pathCount);
  for (let k = 0; k < pathCount; k++) relDelay[k] = (compiled[k] as CompiledPath).delayS - tau0;

  const pathCurves: PathCurves[] = compiled.map((c) => ({
    name: c.name,
    magnitudeDb: new Float64Array(n),
    phaseDeg: new Float64Array(n),
    unwrappedPhaseDeg: new Float64Array(n),
    groupDelayMs: new Float64Array(n),
  }));
  const sumMag = new Float64Array(n);
  const sumPhase = new Float64Array(n);
  const sumUnwrapped = new Float64Array(n);
  const sumGroup = new Float64Array(n);

  const scratch = new Float64Array(4);
  const sc = new Float64Array(2);
  // Per-path unwrap state of the sections' own phase (radians): previous wrapped, previous unwrapped, previous group delay.
  const prevWrapped = new Float64Array(pathCount);
  const prevUnwrapped = new Float64Array(pathCount);
  const prevGroup = new Float64Array(pathCount);
  let sumPrevWrapped = 0;
  let sumPrevUnwrapped = 0;
  let sumPrevGroup = 0;
  let prevOmega = 0;

  for (let i = 0; i < n; i++) {
    const fi = f[i] as number;
    const omega = TWO_PI * fi;
    let sr = 0;
    let si = 0;
    let sdr = 0;
    let sdi = 0;
    for (let k = 0; k < pathCount; k++) {
      const c = compiled[k] as CompiledPath;
      evaluatePlan(c.plan, omega, scratch);
      const hr = scratch[0] as number;
      const hi = scratch[1] as number;
      const dr = scratch[2] as number;
      const di = scratch[3] as number;
      const curves = pathCurves[k] as PathCurves;
      const p = hr * hr + hi * hi;
      const sectionsGroup = -di;
      let phase = 0;
      if (p > SILENT_POWER) {
        curves.magnitudeDb[i] = LN_POWER_TO_DB * Math.log(p);
        phase = fastAtan2(hi, hr);
      } else {
        curves.magnitudeDb[i] = SILENCE_DB;
      }
      let unwrapped: number;
      if (i === 0) unwrapped = phase;
      else {
        const predicted = -0.5 * ((prevGroup[k] as number) + sectionsGroup) * (omega - prevOmega);
        unwrapped = (prevUnwrapped[k] as number) + predicted + wrapRad(phase - (prevWrapped[k] as number) - predicted);
      }
      prevWrapped[k] = phase;
      prevUnwrapped[k] = unwrapped;
      prevGroup[k] = sectionsGroup;
      const delayRad = omega * c.delayS;
      curves.phaseDeg[i] = RAD_TO_DEG * wrapRad(phase - delayRad);
      curves.unwrappedPhaseDeg[i] = RAD_TO_DEG * (unwrapped - delayRad);
      curves.groupDelayMs[i] = 1000 * (sectionsGroup + c.delayS);

      // Sum relative to the earliest path: G = H·e^(−jωΔ), G' = G·(D − jΔ).
      const delta = relDelay[k] as number;
      let gr = hr;
      let gi = hi;
      let gdr = dr;
      let gdi = di;
      if (delta !== 0) {
        sinCos(omega * delta, sc, 0);
        const s = sc[0] as number;
        const co = sc[1] as number;
        gr = hr * co + hi * s;
        gi = hi * co - hr * s;
        gdi = di - delta;
      } else {
        gdr = dr;
      }
      sr += gr;
      si += gi;
      sdr += gr * gdr - gi * gdi;
      sdi += gr * gdi + gi * gdr;
    }
    const p = sr * sr + si * si;
    let phase = 0;
    let relGroup = 0;
    if (p > SILENT_POWER) {
      sumMag[i] = LN_POWER_TO_DB * Math.log(p);
      phase = fastAtan2(si, sr);
      // −Im(S'/S) = −(sdi·sr − sdr·si)/|S|²
      relGroup = -(sdi * sr - sdr * si) / p;
    } else {
      sumMag[i] = SILENCE_DB;
    }
    let unwrapped: number;
    if (i === 0) unwrapped = phase;
    else {
      const predicted = -0.5 * (sumPrevGroup + relGroup) * (omega - prevOmega);
      unwrapped = sumPrevUnwrapped + predicted + wrapRad(phase - sumPrevWrapped - predicted);
    }
    sumPrevWrapped = phase;
    sumPrevUnwrapped = unwrapped;
    sumPrevGroup = relGroup;
    prevOmega = omega;
    const delayRad = omega * tau0;
    sumPhase[i] = RAD_TO_DEG * wrapRad(phase - delayRad);
    sumUnwrapped[i] = RAD_TO_DEG * (unwrapped - delayRad);
    sumGroup[i] = p > SILENT_POWER ? 1000 * (relGroup + tau0) : 0;
  }
  return {
    frequencyHz: Float64Array.from(f),
    paths: pathCurves,
    sum: { magnitudeDb: sumMag, phaseDeg: sumPhase, unwrappedPhaseDeg: sumUnwrapped, groupDelayMs: sumGroup },
  };
}
