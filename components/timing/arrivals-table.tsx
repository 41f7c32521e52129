import { formatHzReadout, formatNumber, formatSigned, formatValue, subTraceStyle } from '@/components/charts';
import type { UnitSystem } from '@/components/system/system-context';
import type { TimingAnswer } from '@/lib/system-model/timing';
import { lengthText } from './length-text';

const UNKNOWN = <span className="text-ink-faint">not known</span>;
const ms = (v: number | null) => (v === null ? UNKNOWN : `${formatNumber(v, 2)} ms`);
const distance = (v: number | null, units: UnitSystem) => (v === null ? UNKNOWN : lengthText(v, units));
/** Where an arrival comes from, when it is not the layout's distance. */
const fromMeasurement = (a: TimingAnswer['mains']) => (a.arrivalFrom === 'measured' ? ' (measured peak)' : '');

/**
 * When the mains and each sub arrive at the MLP (air time plus the delay set), and their phase difference at the
 * crossover. On measurements an arrival is the impulse response's peak, or not known (a text file without one).
 */
export function ArrivalsTable({ data, temperatureC, units, pending }: { data: TimingAnswer; temperatureC: number; units: UnitSystem; pending: boolean }) {
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full min-w-[40rem] border-collapse text-sm" data-testid="timing-arrivals">
        <caption className="pb-2 text-left text-sm text-ink-soft">
          Arrival at the MLP at {formatValue(temperatureC, '°C', 0)} (c = {formatNumber(data.speedOfSoundMps, 1)} m/s) and phase at {formatHzReadout(data.crossoverHz)}
          {pending ? <span className="ml-2 text-ink-faint">updating…</span> : null}
        </caption>
        <thead>
          <tr className="border-b border-line text-left text-xs text-ink-soft">
            <th scope="col" className="px-2 py-1.5 font-medium">Source</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Distance</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Air time</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Delay set</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Arrives</th>
            <th scope="col" className="px-2 py-1.5 font-medium" title="mains phase minus sub phase at the crossover: from the arrival times + from the filters' own phase">Phase difference</th>
          </tr>
        </thead>
        <tbody className="num whitespace-nowrap">
          <tr className="border-b border-line">
            <th scope="row" className="px-2 py-1.5 text-left font-medium text-mains">{data.mains.name} (mains)</th>
            <td className="px-2 py-1.5">{distance(data.mains.distanceM, units)}</td>
            <td className="px-2 py-1.5">
              {ms(data.mains.arrivalMs)}
              {fromMeasurement(data.mains)}
            </td>
            <td className="px-2 py-1.5">{formatNumber(data.mains.delayMs, 2)} ms</td>
            <td className="px-2 py-1.5">{ms(data.mains.totalMs)}</td>
            <td className="px-2 py-1.5 text-ink-faint">reference</td>
          </tr>
          {data.subs.map((s, k) => (
            <tr key={k} className="border-b border-line">
              <th scope="row" className="px-2 py-1.5 text-left font-medium" style={{ color: subTraceStyle(k).color }}>
                {s.name}
              </th>
              <td className="px-2 py-1.5">{distance(s.distanceM, units)}</td>
              <td className="px-2 py-1.5">
                {ms(s.arrivalMs)}
                {fromMeasurement(s)}
              </td>
              <td className="px-2 py-1.5">{formatNumber(s.delayMs, 2)} ms</td>
              <td className="px-2 py-1.5">
                {ms(s.totalMs)}{' '}
                {s.leadMs === null ? null : <span className="text-ink-faint">({s.leadMs >= 0 ? `${formatNumber(s.leadMs, 2)} ms early` : `${formatNumber(-s.leadMs, 2)} ms late`})</span>}
              </td>
              <td className="px-2 py-1.5" data-testid={`timing-phase-${k}`}>
                {formatValue(s.phaseDifferenceDeg, '°', 0)}{' '}
                {s.delayPhaseDeg === null || s.filterPhaseDeg === null ? null : (
                  <span className="text-ink-faint">
                    = {formatSigned(s.delayPhaseDeg, '°', 0)} arrival {formatSigned(s.filterPhaseDeg, '°', 0)} filters
                  </span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
