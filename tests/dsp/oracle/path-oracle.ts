import Complex from 'complex.js';
import fc from 'fast-check';
import type { FilterFamily, FilterSpec, PathSpec, RolloffChain, RolloffSpec } from '@/dsp';

// An evaluation of a path's transfer function written from the published definitions, independent of dsp/:
// no analog sections, no Q tables, no kernel. Every value is a complex.js number (reference library) built from
// the pole positions or the polynomial ratio of each definition. Shared by the blend and delay-search oracle tests.

const ONE = new Complex(1, 0);

/** s = jω. */
export function jOmega(omega: number): Complex {
  return new Complex(0, omega);
}

/**
 * Butterworth low-/high-pass of order n with corner ω0 from its poles s_k = ω0·e^(jπ(2k+n−1)/(2n)), k = 1..n
 * (published: S. Butterworth, "On the Theory of Filter Amplifiers", Wireless Engineer 7, 1930):
 * low-pass Π (−s_k)/(s − s_k) (unity at DC), high-pass Π s/(s − s_k) = sⁿ/Π(s − s_k) (unity at ∞).
 */
export function butterworthOracle(order: number, cornerHz: number, response: 'lowpass' | 'highpass', s: Complex): Complex {
  const w0 = 2 * Math.PI * cornerHz;
  let h = ONE;
  for (let k = 1; k <= order; k++) {
    const theta = (Math.PI * (2 * k + order - 1)) / (2 * order);
    const pole = new Complex(w0 * Math.cos(theta), w0 * Math.sin(theta));
    const numerator = response === 'lowpass' ? pole.neg() : s;
    h = h.mul(numerator.div(s.sub(pole)));
  }
  return h;
}

/** A crossover filter: Butterworth as above; Linkwitz–Riley of order n = the Butterworth of order n/2, squared (published: S. H. Linkwitz, J. Audio Eng. Soc. 24(1), 1976). 'none' is a wire. */
export function filterOracle(filter: FilterSpec, s: Complex): Complex {
  if (filter.response === 'none') return ONE;
  if (filter.family === 'butterworth') return butterworthOracle(filter.order, filter.cornerHz, filter.response, s);
  const half = butterworthOracle(filter.order / 2, filter.cornerHz, filter.response, s);
  return half.mul(half);
}

/** Second-order denominator s² + s·ω0/Q + ω0². */
function secondOrderDenominator(cornerHz: number, q: number, s: Complex): Complex {
  const w0 = 2 * Math.PI * cornerHz;
  return s.mul(s).add(s.mul(w0 / q)).add(w0 * w0);
}

/**
 * A speaker's natural roll-off as the types define it (dsp/filters/filter-types.ts: the DEFINITION mirrored, not the code):
 * sealed = s²/(s² + s·ω0/Q + ω0²) (published: R. H. Small, "Closed-Box Loudspeaker Systems", J. Audio Eng. Soc. 20, 1972);
 * vented = fourth-order Butterworth high-pass at the corner (published: A. N. Thiele, "Loudspeakers in Vented Boxes",
 * J. Audio Eng. Soc. 19, 1971, the B4 alignment); lowpass (a sub's upper roll-off) = ω0²/(s² + s·ω0/Q + ω0²).
 */
export function rolloffOracle(rolloff: RolloffSpec, s: Complex): Complex {
  switch (rolloff.kind) {
    case 'none':
      return ONE;
    case 'sealed':
      return s.mul(s).div(secondOrderDenominator(rolloff.cornerHz, rolloff.q, s));
    case 'lowpass': {
      const w0 = 2 * Math.PI * rolloff.cornerHz;
      return new Complex(w0 * w0, 0).div(secondOrderDenominator(rolloff.cornerHz, rolloff.q, s));
    }
    case 'vented':
      return butterworthOracle(4, rolloff.cornerHz, 'highpass', s);
  }
}

/** A chain of roll-offs applies every one of them: their product. */
export function rolloffChainOracle(chain: RolloffChain | undefined, s: Complex): Complex {
  if (chain === undefined) return ONE;
  const list: readonly RolloffSpec[] = Array.isArray(chain) ? chain : [chain as RolloffSpec];
  return list.reduce((h, r) => h.mul(rolloffOracle(r, s)), ONE);
}

/** Speed of sound in dry air c = 331.3·√(1 + T/273.15) m/s (published: L. E. Kinsler et al., "Fundamentals of Acoustics", 4th ed., 2000). */
export function speedOfSoundOracle(temperatureC: number): number {
  return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}

/** A path's total delay τ = delayMs/1000 + distanceM/c, seconds. */
export function pathDelayOracleS(path: PathSpec, temperatureC: number): number {
  return path.delayMs / 1000 + (path.distanceM ?? 0) / speedOfSoundOracle(temperatureC);
}

/** One path at angular frequency ω: 10^(gainDb/20) · (−1 if inverted) · filter · roll-offs · e^(−jωτ). */
export function pathOracle(path: PathSpec, temperatureC: number, omega: number): Complex {
  const s = jOmega(omega);
  const gain = Math.pow(10, path.gainDb / 20) * (path.invert ? -1 : 1);
  const tau = pathDelayOracleS(path, temperatureC);
  const delay = new Complex(0, -omega * tau).exp();
  return filterOracle(path.filter, s).mul(rolloffChainOracle(path.rolloff, s)).mul(delay).mul(gain);
}

/** The sum of the paths and Σ|H_k| (the size of the terms, for the conditioning of a cancelling sum). */
export function sumOracle(paths: readonly PathSpec[], temperatureC: number, omega: number): { sum: Complex; termSize: number } {
  let sum = new Complex(0, 0);
  let termSize = 0;
  for (const p of paths) {
    const h = pathOracle(p, temperatureC, omega);
    sum = sum.add(h);
    termSize += h.abs();
  }
  return { sum, termSize };
}

/**
 * Group delay −dφ/dω, seconds, by a central difference of the phase at ω(1 ± δ): the phase step is arg(H₊·conj(H₋)),
 * the unwrapped difference while it stays under π, over the step actually taken between the two rounded frequencies
 * (common practice numeric derivative).
 */
export function groupDelayOracleS(evaluate: (omega: number) => Complex, omega: number, delta = 1e-6): number {
  const up = omega * (1 + delta);
  const down = omega * (1 - delta);
  return -evaluate(up).mul(evaluate(down).conjugate()).arg() / (up - down);
}

/**
 * Group delay −dφ/dω, seconds, with a bound on its own error: central differences at ω(1 ± δ), ω(1 ± 2δ), ω(1 ± 4δ)
 * combined by Richardson extrapolation (the δ² term cancels; the gap between the δ and 2δ extrapolations bounds what
 * remains), plus the phase rounding `phaseRounding` (rad) over the step. Starts at δ = 1e-6 and divides δ by 8 until the
 * truncation falls under the rounding, keeping the smallest bound. A step is used only when H changes by less than a
 * tenth of |H| across the widest stencil, so no zero of H near the jω axis (where the phase jumps by π) lies between
 * the samples; near such a zero δ shrinks until that holds. Bound +∞ when no step qualifies (a numerically exact null).
 */
export function groupDelayWithBoundS(evaluate: (omega: number) => Complex, omega: number, phaseRounding: number): { valueS: number; boundS: number } {
  let best = { valueS: NaN, boundS: Infinity };
  const centre = evaluate(omega).abs();
  for (let delta = 1e-6; delta >= 1e-13; delta /= 8) {
    const spread = evaluate(omega * (1 + 4 * delta)).sub(evaluate(omega * (1 - 4 * delta))).abs();
    if (!(spread <= 0.1 * centre)) continue;
    const g1 = groupDelayOracleS(evaluate, omega, delta);
    const g2 = groupDelayOracleS(evaluate, omega, 2 * delta);
    const g4 = groupDelayOracleS(evaluate, omega, 4 * delta);
    const valueS = (4 * g1 - g2) / 3;
    const truncation = Math.abs(valueS - (4 * g2 - g4) / 3);
    const rounding = (2 * phaseRounding) / (omega * delta);
    const boundS = truncation + rounding;
    if (boundS < best.boundS) best = { valueS, boundS };
    if (truncation <= rounding) break;
  }
  return best;
}

// ── Random realistic paths (fast-check) ────────────────────────────────────────────────────────────────────────

const corner = (min: number, max: number): fc.Arbitrary<number> => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** Every family and order: Butterworth 1–8, Linkwitz–Riley 2/4/8; high-pass, low-pass or none; corners 20–300 Hz. */
export const arbFilter: fc.Arbitrary<FilterSpec> = fc.oneof(
  fc.record({
    family: fc.constant<FilterFamily>('butterworth'),
    order: fc.integer({ min: 1, max: 8 }),
    response: fc.constantFrom('lowpass' as const, 'highpass' as const, 'none' as const),
    cornerHz: corner(20, 300),
  }),
  fc.record({
    family: fc.constant<FilterFamily>('linkwitz-riley'),
    order: fc.constantFrom(2, 4, 8),
    response: fc.constantFrom('lowpass' as const, 'highpass' as const, 'none' as const),
    cornerHz: corner(20, 300),
  }),
);

/** One natural roll-off of any kind. */
export const arbRolloff: fc.Arbitrary<RolloffSpec> = fc.oneof(
  fc.constant<RolloffSpec>({ kind: 'none' }),
  fc.record({ kind: fc.constant('sealed' as const), cornerHz: corner(15, 120), q: corner(0.5, 1.5) }),
  fc.record({ kind: fc.constant('vented' as const), cornerHz: corner(15, 80) }),
  fc.record({ kind: fc.constant('lowpass' as const), cornerHz: corner(60, 300), q: corner(0.5, 1.2) }),
);

/** No roll-off, one, or a chain of up to three (e.g. a sub's low and upper roll-offs). */
export const arbRolloffChain: fc.Arbitrary<RolloffChain | undefined> = fc.oneof(
  fc.constant(undefined),
  arbRolloff,
  fc.array(arbRolloff, { minLength: 1, maxLength: 3 }),
);

/** A path with gains −20…+10 dB, processor delays 0–30 ms, air paths 0–10 m (or none), either polarity. */
export const arbPath = (name: string, filter: fc.Arbitrary<FilterSpec> = arbFilter): fc.Arbitrary<PathSpec> =>
  fc.record(
    {
      name: fc.constant(name),
      filter,
      rolloff: arbRolloffChain,
      gainDb: fc.double({ min: -20, max: 10, noNaN: true, noDefaultInfinity: true }),
      delayMs: fc.double({ min: 0, max: 30, noNaN: true, noDefaultInfinity: true }),
      invert: fc.boolean(),
      distanceM: fc.option(fc.double({ min: 0, max: 10, noNaN: true, noDefaultInfinity: true }), { nil: undefined }),
    },
    { requiredKeys: ['name', 'filter', 'gainDb', 'delayMs', 'invert'] },
  );

/** Temperatures −10…40 °C. */
export const arbTemperatureC: fc.Arbitrary<number> = fc.double({ min: -10, max: 40, noNaN: true, noDefaultInfinity: true });
