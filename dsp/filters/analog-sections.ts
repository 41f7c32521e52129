import { assertIntegerInRange, assertPositive } from '../internal/guards';
import { butterworthQ } from './butterworth-q';
import type { AnalogSection, FilterSpec, RolloffChain, RolloffSpec } from './filter-types';

/** Butterworth orders allowed: 1..8; Linkwitz–Riley: 2, 4, 8. */
export const LINKWITZ_RILEY_ORDERS: readonly number[] = [2, 4, 8];

function butterworthSections(response: 'lowpass' | 'highpass', order: number, cornerHz: number): AnalogSection[] {
  const sections: AnalogSection[] = [];
  const second = response === 'lowpass' ? 'lowpass2' : 'highpass2';
  for (const q of butterworthQ(order)) sections.push({ kind: second, cornerHz, q });
  if (order % 2 === 1) sections.push({ kind: response === 'lowpass' ? 'lowpass1' : 'highpass1', cornerHz, q: 0.5 });
  return sections;
}

/**
 * The analog sections of a crossover filter: Butterworth order n, or Linkwitz–Riley n as a Butterworth of
 * order n/2 squared (Linkwitz, J. Audio Eng. Soc. 24(1), 1976). 'none' gives no sections.
 * @example filterSections({ family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }).length // 2
 */
export function filterSections(filter: FilterSpec): AnalogSection[] {
  if (filter.response === 'none') return [];
  if (filter.response !== 'lowpass' && filter.response !== 'highpass') {
    throw new RangeError(`filter.response must be 'lowpass', 'highpass' or 'none' (got ${String(filter.response)})`);
  }
  assertPositive('filter.cornerHz', filter.cornerHz);
  if (filter.family === 'butterworth') {
    assertIntegerInRange('filter.order', filter.order, 1, 8);
    return butterworthSections(filter.response, filter.order, filter.cornerHz);
  }
  if (filter.family === 'linkwitz-riley') {
    if (!LINKWITZ_RILEY_ORDERS.includes(filter.order)) {
      throw new RangeError(`filter.order must be 2, 4 or 8 for linkwitz-riley (got ${String(filter.order)})`);
    }
    const half = butterworthSections(filter.response, filter.order / 2, filter.cornerHz);
    return [...half, ...half];
  }
  throw new RangeError(`filter.family must be 'butterworth' or 'linkwitz-riley' (got ${String(filter.family)})`);
}

/** Highest quality factor a roll-off or section may have. */
export const MAX_SECTION_Q = 50;

/** Most roll-offs one path may chain (e.g. a sub's natural low roll-off and its upper roll-off). */
export const MAX_ROLLOFFS = 4;

function singleRolloffSections(rolloff: RolloffSpec | undefined, name: string): AnalogSection[] {
  if (rolloff === undefined || rolloff === null) return [];
  if (typeof rolloff !== 'object') throw new RangeError(`${name} must be an object with a kind`);
  if (rolloff.kind === 'none') return [];
  switch (rolloff.kind) {
    case 'sealed':
    case 'lowpass': {
      assertPositive(`${name}.cornerHz`, rolloff.cornerHz);
      assertPositive(`${name}.q`, rolloff.q);
      if (rolloff.q > MAX_SECTION_Q) throw new RangeError(`${name}.q must be at most ${MAX_SECTION_Q} (got ${rolloff.q})`);
      return [{ kind: rolloff.kind === 'sealed' ? 'highpass2' : 'lowpass2', cornerHz: rolloff.cornerHz, q: rolloff.q }];
    }
    case 'vented':
      assertPositive(`${name}.cornerHz`, rolloff.cornerHz);
      return butterworthSections('highpass', 4, rolloff.cornerHz);
    default:
      throw new RangeError(`${name}.kind must be 'none', 'sealed', 'vented' or 'lowpass' (got ${String((rolloff as { kind: unknown }).kind)})`);
  }
}

/**
 * The analog sections of a speaker's natural roll-off: sealed = second-order high-pass (Small, J. Audio Eng.
 * Soc. 20, 1972), vented = fourth-order Butterworth (B4) high-pass (Thiele, J. Audio Eng. Soc. 19, 1971),
 * lowpass = second-order low-pass (a sub's upper roll-off), none = no sections. A list (at most MAX_ROLLOFFS)
 * applies every roll-off in it: the product of their sections, e.g. a sub's low roll-off and its upper roll-off.
 * Errors name `rolloff.…` for one roll-off and `rolloff[i].…` for a list.
 * @example rolloffSections({ kind: 'sealed', cornerHz: 50, q: 0.707 }).length // 1
 * @example rolloffSections([{ kind: 'vented', cornerHz: 22 }, { kind: 'lowpass', cornerHz: 160, q: 0.7 }]).length // 3
 */
export function rolloffSections(rolloff: RolloffChain | undefined): AnalogSection[] {
  if (!Array.isArray(rolloff)) return singleRolloffSections(rolloff as RolloffSpec | undefined, 'rolloff');
  const list = rolloff as readonly RolloffSpec[];
  if (list.length > MAX_ROLLOFFS) throw new RangeError(`rolloff must hold at most ${MAX_ROLLOFFS} roll-offs (got ${list.length})`);
  const sections: AnalogSection[] = [];
  list.forEach((r, i) => sections.push(...singleRolloffSections(r, `rolloff[${i}]`)));
  return sections;
}
