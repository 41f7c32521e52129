/**
 * Tick arithmetic for a log-frequency axis: labelled ticks at 1, 2 and 5 × each decade
 * (10, 20, 50, 100 … 20k) and minor grid lines at the other whole multiples (3, 4, 6–9 × decade).
 */

export interface LogTick {
  hz: number;
  label: string;
}

export interface LogTicks {
  /** Labelled ticks, ascending. */
  major: LogTick[];
  /** Unlabelled grid lines, ascending, excluding the major ones. */
  minor: number[];
}

const LABEL_MULTIPLES = [1, 2, 5] as const;

/** `formatHz(2000)` → `"2k"`, `formatHz(500)` → `"500"`, `formatHz(1500)` → `"1.5k"`. */
export function formatHz(hz: number): string {
  if (!Number.isFinite(hz)) return '—';
  if (Math.abs(hz) >= 1000) return `${trimNumber(hz / 1000)}k`;
  return trimNumber(hz);
}

function trimNumber(value: number): string {
  return String(Number(value.toPrecision(value >= 100 ? 4 : 3)));
}

// 10 ** k times m without the binary noise of negative powers (0.1 * 3 = 0.30000000000000004).
function multipleOfDecade(m: number, k: number): number {
  return Number((m * 10 ** k).toPrecision(12));
}

/**
 * `logTicks(10, 1000)` → major 10, 20, 50, 100, 200, 500, 1000 (labels "10" … "1k") and minor
 * 30, 40, 60, 70, 80, 90, 300 … 900. Bounds are inclusive (with a relative tolerance of 1e-9).
 */
export function logTicks(minHz: number, maxHz: number): LogTicks {
  if (!(minHz > 0) || !(maxHz > minHz) || !Number.isFinite(maxHz)) {
    throw new RangeError(`logTicks needs 0 < minHz < maxHz (got ${minHz}, ${maxHz})`);
  }
  const lo = minHz * (1 - 1e-9);
  const hi = maxHz * (1 + 1e-9);
  const major: LogTick[] = [];
  const minor: number[] = [];
  for (let k = Math.floor(Math.log10(minHz)); k <= Math.ceil(Math.log10(maxHz)); k++) {
    for (let m = 1; m <= 9; m++) {
      const hz = multipleOfDecade(m, k);
      if (hz < lo || hz > hi) continue;
      if ((LABEL_MULTIPLES as readonly number[]).includes(m)) major.push({ hz, label: formatHz(hz) });
      else minor.push(hz);
    }
  }
  return { major, minor };
}

/**
 * Which labelled ticks fit: with less than `labelWidthPx` between 1× and 2× a decade
 * (log10 2 ≈ 0.301 decade apart), keep only the labels at whole decades (10, 100, 1k …).
 * `thinLogTicks(ticks, pxPerDecade, labelWidthPx)` returns the ticks to label.
 */
export function thinLogTicks(major: readonly LogTick[], pxPerDecade: number, labelWidthPx: number): LogTick[] {
  if (pxPerDecade * Math.log10(2) >= labelWidthPx) return [...major];
  return major.filter((t) => {
    const mantissa = t.hz / 10 ** Math.floor(Math.log10(t.hz) + 1e-9);
    return Math.abs(mantissa - 1) < 1e-6;
  });
}
