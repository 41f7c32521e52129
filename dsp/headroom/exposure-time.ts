import { assertFinite } from '../internal/guards';

/**
 * Permissible daily exposure at a level, minutes: 480 / 2^((L − 85)/3) (NIOSH, "Criteria for a Recommended Standard:
 * Occupational Noise Exposure", 1998: 85 dBA for 8 h, 3 dB exchange rate).
 * @example exposureMinutes({ levelDba: 100 }) // 15
 */
export function exposureMinutes({ levelDba }: { readonly levelDba: number }): number {
  assertFinite('levelDba', levelDba);
  return 480 / Math.pow(2, (levelDba - 85) / 3);
}
