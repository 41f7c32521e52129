import { formatHzReadout, formatSigned, formatValue } from '@/components/charts';
import type { BlendMetricsAnswer } from '@/lib/system-model/blend';

function Item({ label, value, detail, testId, tone }: { label: string; value: string; detail?: string; testId: string; tone?: 'warn' }) {
  return (
    <div className="flex min-w-0 flex-col rounded-md border border-line bg-white px-3 py-2">
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd className={`num text-base font-semibold ${tone === 'warn' ? 'text-warn-strong' : 'text-ink'}`} data-testid={testId}>
        {value}
      </dd>
      {detail ? <dd className="text-xs text-ink-faint">{detail}</dd> : null}
    </div>
  );
}

/** The Blend read-outs: levels at the crossover, phase difference, the one flatness measure, dip, −3 dB point. */
export function BlendReadouts({ metrics, pathNames }: { metrics: BlendMetricsAnswer | null; pathNames: string[] }) {
  if (!metrics) {
    return <p className="text-sm text-ink-faint">Read-outs appear when the blend has been computed.</p>;
  }
  const fc = formatHzReadout(metrics.crossoverHz);
  const phase = metrics.phaseDifferenceDeg;
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3 xl:grid-cols-4" aria-label="Blend read-outs" aria-live="polite">
      {metrics.pathLevelsDb.map((level, k) => (
        <Item key={k} label={`${k === metrics.mainsPath ? 'Mains' : pathNames[k] ?? `Path ${k + 1}`} at ${fc}`} value={formatSigned(level, 'dB', 1)} testId={k === metrics.mainsPath ? 'readout-mains-level' : `readout-path-${k}-level`} />
      ))}
      <Item label={`Sum at ${fc}`} value={formatSigned(metrics.sumLevelDb, 'dB', 1)} testId="readout-sum-level" />
      <Item
        label="Phase difference at the crossover"
        value={phase === null ? '—' : formatValue(phase, '°', 0)}
        detail={phase === null ? undefined : `mains − ${pathNames[metrics.subPath ?? 1] ?? 'sub'}; ${Math.abs(phase) <= 30 ? 'close to in phase' : Math.abs(phase) >= 150 ? 'close to opposite: they cancel' : 'partly out of phase'}`}
        tone={phase !== null && Math.abs(phase) > 60 ? 'warn' : undefined}
        testId="readout-phase-difference"
      />
      <Item
        label={`Flatness, ${formatHzReadout(metrics.bandHz[0])}–${formatHzReadout(metrics.bandHz[1])}`}
        value={`±${metrics.flatnessDb.toFixed(2)} dB`}
        detail={`largest deviation ${formatSigned(metrics.maxDeviationDb, 'dB', 2)} at ${formatHzReadout(metrics.maxDeviationHz)}, from the sum at ${formatHzReadout(metrics.referenceHz)}`}
        tone={metrics.flatnessDb > 3 ? 'warn' : undefined}
        testId="readout-max-deviation"
      />
      <Item label="Deepest dip" value={formatSigned(metrics.deepestDipDb, 'dB', 1)} detail={`at ${formatHzReadout(metrics.deepestDipHz)}`} tone={metrics.deepestDipDb < -3 ? 'warn' : undefined} testId="readout-deepest-dip" />
      <Item label="System −3 dB point" value={metrics.minus3DbHz === null ? 'below 5 Hz' : formatHzReadout(metrics.minus3DbHz)} detail="low end of the sum" testId="readout-minus3" />
    </dl>
  );
}
