// A small seeded pseudo-random generator, so searches that sample are repeatable: the same seed gives the same answer.

/**
 * Uniform numbers in [0, 1) from a 32-bit seed (mulberry32, T. Ettinger 2017, public domain; common practice for
 * repeatable sampling where statistical quality beyond a few million draws does not matter).
 * @example const next = seededRandom(1); next() // 0.627…
 */
export function seededRandom(seed: number): () => number {
  let a = (Math.floor(seed) >>> 0) + 0x6d2b79f5;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
