'use client';

import { useState } from 'react';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { applyPairPlacementToDocument, currentPairMeasures, planPairPlacement, PLACEABLE_PAIRS, type PairEntry as Entry, type PairId } from '@/lib/system-model/layout-pair';
import { formatLength } from '@/lib/units';

type By = 'spacing' | 'angle';

const deg = (v: number) => `${v.toFixed(1)}°`;

/**
 * A pair entered as it is measured on site: the front pair by the spacing between L and R (or the included angle) and
 * the distance from each to the MLP, C on the centre line at the same distance; a surround pair by its angle from
 * straight ahead and the distance. Shows the included angle as the numbers are typed, refuses what cannot be built
 * (saying which speaker and which wall), and moves only the speakers it names (heights kept).
 */
export function PairEntry({ mlpOutside }: { mlpOutside: boolean }) {
  const { doc, update, units, readOnly } = useSystem();
  const available = PLACEABLE_PAIRS.filter((p) => [p.left, p.right].every((c) => doc.speakers.some((s) => s.channel === c)));
  const start = (id: PairId) => {
    const m = currentPairMeasures(doc, id);
    return { distanceM: m?.distanceM ?? 2.5, spacingM: m?.spacingM ?? 2.5, includedAngleDeg: Number((m?.includedAngleDeg ?? 60).toFixed(1)), azimuthDeg: Number((m?.azimuthDeg ?? 110).toFixed(1)) };
  };
  const [pairId, setPairId] = useState<PairId>(available[0]?.id ?? 'front');
  const [values, setValues] = useState(() => start(available[0]?.id ?? 'front'));
  const [by, setBy] = useState<By>('spacing');
  // C goes on the arc too unless the present L/R distance would put it through the front wall (then it starts unticked).
  const [placeCentre, setPlaceCentre] = useState(() => {
    const id = available[0]?.id;
    return id !== 'front' || planPairPlacement(doc, { pair: 'front', distanceM: values.distanceM, spacingM: values.spacingM, placeCentre: true }, units).ok;
  });
  const [message, setMessage] = useState<string | null>(null);
  if (available.length === 0) return null;
  const pair = available.find((p) => p.id === pairId) ?? available[0]!;
  const front = pair.id === 'front';
  const hasCentre = front && doc.speakers.some((s) => s.channel === 'C');
  const entry: Entry = front
    ? by === 'spacing'
      ? { pair: pair.id, distanceM: values.distanceM, spacingM: values.spacingM, placeCentre: hasCentre && placeCentre }
      : { pair: pair.id, distanceM: values.distanceM, includedAngleDeg: values.includedAngleDeg, placeCentre: hasCentre && placeCentre }
    : { pair: pair.id, distanceM: values.distanceM, azimuthDeg: values.azimuthDeg };
  const result = planPairPlacement(doc, entry, units);
  const problem = (field: string) => (result.ok ? undefined : result.problems.find((p) => p.field === field)?.message);
  const set = (patch: Partial<typeof values>) => {
    setValues((v) => ({ ...v, ...patch }));
    setMessage(null);
  };
  const names = result.ok ? result.plan.moves.map((m) => m.channel) : [pair.left, pair.right];
  const place = () => {
    if (!result.ok) return;
    const plan = result.plan;
    update((d) => applyPairPlacementToDocument(d, plan));
    const kept = doc.speakers.filter((s) => plan.moves.some((m) => m.id === s.id) && s.distanceOverrideM != null);
    setMessage(
      `Placed ${names.join(', ')} ${formatLength(values.distanceM, units)} from the MLP, ${deg(plan.earAngleDeg)} included.` +
        (kept.length ? ` ${kept.map((s) => s.channel).join(', ')} keep${kept.length > 1 ? '' : 's'} the measured distance set for the processor: clear it under Position if it no longer applies.` : ''),
    );
  };
  const lengthField = { length: true, units, unit: 'm', step: 0.01, digits: 2, disabled: readOnly, className: 'w-40' } as const;
  return (
    <section aria-labelledby="layout-pair" className="flex flex-col gap-3 rounded-md border border-line bg-white p-3" data-testid="pair-entry">
      <h3 id="layout-pair" className="text-base font-semibold">
        Place a pair as measured
      </h3>
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Pair
          <select
            data-testid="pair-select"
            value={pair.id}
            disabled={readOnly}
            onChange={(e) => {
              const id = e.target.value as PairId;
              setPairId(id);
              setValues(start(id));
              setMessage(null);
            }}
            className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink"
          >
            {available.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        {front ? (
          <fieldset className="flex flex-col gap-1">
            <legend className="text-xs font-medium text-ink-soft">Enter by</legend>
            <div className="flex gap-3 pt-1 text-sm">
              {(['spacing', 'angle'] as const).map((b) => (
                <label key={b} className="inline-flex items-center gap-1.5">
                  <input type="radio" name="pair-by" checked={by === b} disabled={readOnly} onChange={() => setBy(b)} className="accent-mains" />
                  {b === 'spacing' ? 'spacing' : 'included angle'}
                </label>
              ))}
            </div>
          </fieldset>
        ) : null}
        {front && by === 'spacing' ? (
          <NumberField label={`Spacing ${pair.left} to ${pair.right}`} value={values.spacingM} onChange={(v) => set({ spacingM: v })} min={0.05} max={40} error={problem('spacing')} testId="pair-spacing" hint={units === 'imperial' ? `e.g. 123.5 in or 10' 3.5"` : 'e.g. 3.14 m or 314 cm'} {...lengthField} />
        ) : (
          <NumberField
            label={front ? 'Included angle' : 'Angle from straight ahead'}
            unit="°"
            value={front ? values.includedAngleDeg : values.azimuthDeg}
            onChange={(v) => set(front ? { includedAngleDeg: v } : { azimuthDeg: v })}
            min={0.1}
            max={front ? 180 : 179.9}
            step={0.1}
            digits={1}
            error={problem('angle')}
            disabled={readOnly}
            testId="pair-angle"
            className="w-40"
          />
        )}
        <NumberField label="Distance from the MLP to each" value={values.distanceM} onChange={(v) => set({ distanceM: v })} min={0.1} max={60} error={problem('distance')} testId="pair-distance" hint="ears to speaker, straight line" {...lengthField} className="w-56" />
        {hasCentre ? (
          <label className="inline-flex items-center gap-1.5 pb-2 text-sm">
            <input type="checkbox" checked={placeCentre} disabled={readOnly} onChange={(e) => setPlaceCentre(e.target.checked)} className="accent-mains" />
            C on the centre line at the same distance
          </label>
        ) : null}
        <Button variant="secondary" onClick={place} disabled={readOnly || mlpOutside || !result.ok} data-testid="place-pair">
          Place {names.join(', ')}
        </Button>
      </div>
      <p className="text-sm" aria-live="polite">
        {result.ok ? (
          <>
            Included angle <strong className="num" data-testid="pair-included-angle">{deg(result.plan.earAngleDeg)}</strong>
            {deg(result.plan.earAngleDeg) !== deg(result.plan.includedAngleDeg) ? (
              <span className="text-ink-soft">
                {' '}
                at the ears; <span className="num" data-testid="pair-floor-angle">{deg(result.plan.includedAngleDeg)}</span> in the floor plan (the speakers are not at ear height; the angle checks use the floor plan)
              </span>
            ) : null}
            {front && by === 'angle' ? <span className="text-ink-soft"> · spacing {formatLength(result.plan.spacingM, units)}</span> : null}
            <span className="text-ink-soft"> · placed symmetrically about the MLP’s centre line; heights stay as they are.</span>
          </>
        ) : (
          <span className="text-ink-soft">Nothing is placed until the numbers fit.</span>
        )}
      </p>
      {!result.ok && result.problems.some((p) => p.field === 'room' || p.field === 'pair') ? (
        <ul className="list-disc pl-5 text-xs text-fail" data-testid="pair-problems" role="alert">
          {result.problems
            .filter((p) => p.field === 'room' || p.field === 'pair')
            .map((p) => (
              <li key={p.message}>{p.message}</li>
            ))}
        </ul>
      ) : null}
      {message ? (
        <p role="status" className="text-xs text-ok">
          {message}
        </p>
      ) : null}
    </section>
  );
}
