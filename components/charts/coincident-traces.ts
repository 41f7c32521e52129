import type { PlotTrace } from './plot-types';

/**
 * Traces that draw on top of each other (e.g. two subs at the same distance): a later trace
 * equal to an earlier one at every sample, within `toleranceDb` (0.01 by default, in the plot's
 * y unit), says "same as <earlier>" in the legend and is drawn with a dash that leaves gaps, each
 * copy at its own offset, so every colour of the group stays visible.
 */

/** Largest difference at which two samples count as equal (plot y units, e.g. dB). */
const COINCIDENT_TOLERANCE = 0.01;
/** Length of one dash of a coinciding trace, px before emphasis scaling. */
const COINCIDENT_DASH_PX = 8;

/** Whether `a` and `b` agree within `tolerance` at every sample (NaN/±Infinity only where the other has the same). */
export function tracesCoincide(a: ArrayLike<number>, b: ArrayLike<number>, tolerance = COINCIDENT_TOLERANCE): boolean {
  if (a.length !== b.length || a.length === 0) return false;
  for (let i = 0; i < a.length; i++) {
    const va = a[i] ?? NaN;
    const vb = b[i] ?? NaN;
    if (Number.isFinite(va) || Number.isFinite(vb)) {
      if (!(Math.abs(va - vb) <= tolerance)) return false;
    } else if (!Object.is(va, vb) && !(Number.isNaN(va) && Number.isNaN(vb))) {
      return false;
    }
  }
  return true;
}

/**
 * The traces with each coinciding copy marked: `note` gains "same as <label of the first of its
 * group>" and `dash` places its dashes in its own slot of the group's period (the first trace of a
 * group keeps its own stroke). Traces that match nothing come back unchanged (the same objects).
 */
export function markCoincidentTraces<T extends PlotTrace>(traces: readonly T[], tolerance = COINCIDENT_TOLERANCE): T[] {
  const groupOf = traces.map(() => -1);
  const groups: number[][] = [];
  traces.forEach((t, i) => {
    const g = groups.findIndex((members) => tracesCoincide(traces[members[0] ?? 0]?.values ?? [], t.values, tolerance));
    if (g >= 0) groups[g]?.push(i);
    else groups.push([i]);
    groupOf[i] = g >= 0 ? g : groups.length - 1;
  });
  return traces.map((t, i) => {
    const members = groups[groupOf[i] ?? 0] ?? [];
    const slot = members.indexOf(i);
    if (members.length < 2 || slot < 1) return t;
    const first = traces[members[0] ?? 0];
    const sameAs = `same as ${first?.label ?? ''}`;
    const periodPx = COINCIDENT_DASH_PX * members.length;
    return {
      ...t,
      note: t.note ? `${t.note}; ${sameAs}` : sameAs,
      dash: { dashPx: COINCIDENT_DASH_PX, gapPx: periodPx - COINCIDENT_DASH_PX, offsetPx: -COINCIDENT_DASH_PX * slot },
    };
  });
}

/** The SVG dash attributes of a trace or legend swatch: its own `dash` at `scale`, else `dashedArray` when `dashed`. */
export function traceDash(t: Pick<PlotTrace, 'dashed' | 'dash'>, scale: number, dashedArray: string): { strokeDasharray?: string; strokeDashoffset?: number } {
  if (t.dash) return { strokeDasharray: `${t.dash.dashPx * scale} ${t.dash.gapPx * scale}`, strokeDashoffset: t.dash.offsetPx * scale };
  return t.dashed ? { strokeDasharray: dashedArray } : {};
}
