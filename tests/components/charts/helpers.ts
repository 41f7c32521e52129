import { expect } from 'vitest';

/** Numbers from every `attr="…"` in the markup, in document order. */
export function attrNumbers(markup: string, attr: string): number[] {
  return [...markup.matchAll(new RegExp(`${attr}="([^"]*)"`, 'g'))].map((m) => Number(m[1]));
}

/** The `d` of the path with `data-trace="id"`, or null. */
export function tracePathD(markup: string, id: string): string | null {
  const m = markup.match(new RegExp(`<path[^>]*data-trace="${id}"[^>]*>`));
  if (!m) return null;
  return m[0].match(/ d="([^"]*)"/)?.[1] ?? null;
}

/** Number of subpaths (M commands) in SVG path data. */
export function subpathCount(d: string): number {
  return (d.match(/M/g) ?? []).length;
}

/** x positions (px, inside the plot group) of the labelled x ticks, in document order. */
export function xTickPositions(markup: string): { value: number; px: number }[] {
  return [...markup.matchAll(/<g transform="translate\(([-\d.e]+),[-\d.e]+\)"><line[^>]*><\/line><text data-x-tick="([^"]+)"/g)].map((m) => ({
    value: Number(m[2]),
    px: Number(m[1]),
  }));
}

export function expectStrictlyIncreasing(values: readonly number[]): void {
  for (let i = 1; i < values.length; i++) expect(values[i]!).toBeGreaterThan(values[i - 1]!);
}

/** Log-spaced grid including startHz, like the blend API's. */
export function logGrid(startHz: number, stopHz: number, pointsPerOctave: number): number[] {
  const n = Math.floor(Math.log2(stopHz / startHz) * pointsPerOctave + 1e-9) + 1;
  return Array.from({ length: n }, (_, i) => startHz * 2 ** (i / pointsPerOctave));
}
