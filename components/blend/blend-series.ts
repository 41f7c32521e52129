import { subTraceStyle, traceStyles, type PlotTrace } from '@/components/charts';
import type { BlendAnswer } from '@/lib/system-model/blend';

/** What Blend draws and downloads from one answer: the traces of its three plots, the CSV columns and the axes. */

export interface BlendTraces {
  magnitude: PlotTrace[];
  phase: PlotTrace[];
  groupDelay: PlotTrace[];
}

/** Mains, each sub and the sum for magnitude and phase; the sum alone for group delay. */
export function blendTraces(data: BlendAnswer | undefined): BlendTraces {
  if (!data) return { magnitude: [] as PlotTrace[], phase: [] as PlotTrace[], groupDelay: [] as PlotTrace[] };
  const [mains, ...subs] = data.paths;
  const magnitude: PlotTrace[] = [];
  const phase: PlotTrace[] = [];
  if (mains) {
    magnitude.push({ id: 'mains', label: `Mains (${mains.name})`, values: mains.magnitudeDb, ...traceStyles.mains });
    phase.push({ id: 'mains', label: `Mains (${mains.name})`, values: mains.phaseDeg, ...traceStyles.mains });
  }
  subs.forEach((s, k) => {
    magnitude.push({ id: `sub-${k}`, label: s.name, values: s.magnitudeDb, ...subTraceStyle(k) });
    phase.push({ id: `sub-${k}`, label: s.name, values: s.phaseDeg, ...subTraceStyle(k) });
  });
  magnitude.push({ id: 'sum', label: 'Sum', values: data.sum.magnitudeDb, ...traceStyles.sum });
  phase.push({ id: 'sum', label: 'Sum', values: data.sum.phaseDeg, ...traceStyles.sum });
  return { magnitude, phase, groupDelay: [{ id: 'sum', label: 'Sum', values: data.sum.groupDelayMs, ...traceStyles.sum }] as PlotTrace[] };
}

/** The CSV of every path's magnitude and phase and the sum's group delay, against frequency. */
export function blendCsv(data: BlendAnswer | undefined) {
  if (!data) return undefined;
  const columns = [
    ...data.paths.flatMap((p, k) => [
      { name: `${k === 0 ? 'mains' : `sub${k}`}_magnitude_db`, values: p.magnitudeDb },
      { name: `${k === 0 ? 'mains' : `sub${k}`}_phase_deg`, values: p.phaseDeg },
    ]),
    { name: 'sum_magnitude_db', values: data.sum.magnitudeDb },
    { name: 'sum_phase_deg', values: data.sum.phaseDeg },
    { name: 'sum_group_delay_ms', values: data.sum.groupDelayMs },
  ];
  return { frequencyHz: data.frequencyHz, columns };
}

/** The magnitude axis: −30 dB up to a little above the loudest trace shown (in 6 dB steps). */
export function magnitudeDomain(data: BlendAnswer | undefined, stopHz: number): [number, number] {
  let top = 6;
  if (data) {
    const f = data.frequencyHz;
    for (const series of [data.sum.magnitudeDb, ...data.paths.map((p) => p.magnitudeDb)]) {
      for (let i = 0; i < f.length; i++) if ((f[i] as number) <= stopHz && (series[i] as number) > top - 1) top = Math.ceil(((series[i] as number) + 1) / 6) * 6;
    }
  }
  return [-30, Math.min(30, top)];
}

/** Group delay axis: the sum's range between 15 Hz and the top, clipped so a null's spike does not flatten the rest. */
export function groupDelayDomain(data: BlendAnswer | undefined): [number, number] {
  if (!data) return [0, 20];
  let lo = 0;
  let hi = 5;
  data.frequencyHz.forEach((f, i) => {
    const v = data.sum.groupDelayMs[i] as number;
    if (f < 15 || !Number.isFinite(v)) return;
    lo = Math.min(lo, Math.max(-20, v));
    hi = Math.max(hi, Math.min(80, v));
  });
  return [Math.floor(lo / 5) * 5, Math.ceil(hi / 5) * 5];
}
