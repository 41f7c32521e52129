import { rolloffResponse } from '../filters/filter-response';
import type { RolloffChain } from '../filters/filter-types';

/**
 * A speaker's own −3 dB point from its natural roll-off (the highest frequency below which its level first falls
 * 3 dB under its passband), Hz; null for no roll-off. Searched on a 1/96-octave grid from 1 Hz to 4 kHz and
 * interpolated (sealed Q = 0.707 and vented B4 roll-offs: −3 dB at their corner — Small 1972, Thiele 1971).
 * @example rolloffMinus3DbHz({ kind: 'vented', cornerHz: 50 }) // ≈ 50
 */
export function rolloffMinus3DbHz(rolloff: RolloffChain | undefined): number | null {
  const chain = rolloff === undefined ? [] : Array.isArray(rolloff) ? rolloff : [rolloff as Exclude<RolloffChain, readonly unknown[]>];
  const highPassOnly = chain.filter((r) => r.kind === 'sealed' || r.kind === 'vented');
  if (highPassOnly.length === 0) return null;
  const f: number[] = [];
  for (let k = 0; k <= 96 * 12; k++) f.push(Math.pow(2, k / 96));
  const { magnitudeDb } = rolloffResponse({ rolloff: highPassOnly, frequencyHz: f });
  // From the top down: the first point below −3 dB relative to the top of the grid (the passband).
  const top = magnitudeDb[magnitudeDb.length - 1] as number;
  for (let i = f.length - 2; i >= 0; i--) {
    const v = (magnitudeDb[i] as number) - top;
    if (v < -3) {
      const v1 = (magnitudeDb[i + 1] as number) - top;
      const t = (-3 - v) / (v1 - v);
      return (f[i] as number) * Math.pow((f[i + 1] as number) / (f[i] as number), t);
    }
  }
  return null;
}
