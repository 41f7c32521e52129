import { assertFinite } from '../internal/guards';

/** Options of {@link combinedSplDb}. */
export interface CombinedSplOptions {
  /** Each source's level at the seat, dB SPL. */
  readonly levelsDb: readonly number[];
  /** 'coherent' (in phase at low frequency: pressures add, 20·log10) or 'power' (uncorrelated: 10·log10). */
  readonly summation: 'coherent' | 'power';
}

/**
 * Level of several sources together at one seat: 20·log10 Σ 10^(Lᵢ/20) in phase, 10·log10 Σ 10^(Lᵢ/10) uncorrelated
 * (any acoustics text, e.g. Kinsler et al., "Fundamentals of Acoustics", 2000). Two equal sources: +6.02 dB or +3.01 dB.
 * @example combinedSplDb({ levelsDb: [100, 100], summation: 'coherent' }) // 106.02
 */
export function combinedSplDb({ levelsDb, summation }: CombinedSplOptions): number {
  if (!Array.isArray(levelsDb) || levelsDb.length === 0) throw new RangeError('levelsDb must hold at least one level');
  if (summation !== 'coherent' && summation !== 'power') throw new RangeError(`summation must be 'coherent' or 'power' (got ${String(summation)})`);
  const factor = summation === 'coherent' ? 20 : 10;
  let total = 0;
  levelsDb.forEach((level, i) => {
    assertFinite(`levelsDb[${i}]`, level);
    total += Math.pow(10, level / factor);
  });
  return factor * Math.log10(total);
}
