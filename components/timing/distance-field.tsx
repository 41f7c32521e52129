'use client';

import { NumberField } from '@/components/ui/number-field';
import { speakerAngles } from '@/dsp';
import { distanceToSeatM, toPointM } from '@/lib/system-model/geometry';
import type { Speaker, Sub, SystemDocument } from '@/lib/validations/system';
import { lengthText } from './length-text';

/** The distance from the MLP to a speaker or sub by their positions alone (no override), m. */
const geometryM = (doc: SystemDocument, item: Speaker | Sub): number => {
  const seat = doc.seats.find((s) => s.id === doc.mlpSeatId) ?? doc.seats[0];
  return seat ? speakerAngles({ listenerM: toPointM(seat), speakerM: toPointM(item) }).distanceM : 0;
};

/**
 * The distance set on the processor for a speaker or sub: editing it sets the measured distance the processor is
 * told (its delays align these); the sound still travels the positions' path, so a wrong setting shows as a phase
 * error. "Use the positions" clears it.
 */
export function DistanceField({ label, doc, item, onOverride, units, error, disabled, testId }: { label: string; doc: SystemDocument; item: Speaker | Sub; onOverride: (m: number | null) => void; units: 'metric' | 'imperial'; error?: string; disabled?: boolean; testId: string }) {
  const fromGeometry = geometryM(doc, item);
  const overridden = item.distanceOverrideM != null;
  const shown = (m: number) => lengthText(m, units);
  return (
    <div className="flex flex-col gap-1">
      <NumberField label={label} length units={units} value={distanceToSeatM(doc, item)} min={0.1} max={100} step={0.01} digits={2} disabled={disabled} error={error} onChange={(v) => onOverride(v)} testId={testId} hint={overridden ? `measured; the positions give ${shown(fromGeometry)}` : 'from the positions on Layout'} />
      {overridden ? (
        <button type="button" disabled={disabled} onClick={() => onOverride(null)} className="self-start text-xs text-mains underline hover:text-ink">
          Use the positions ({shown(fromGeometry)})
        </button>
      ) : null}
    </div>
  );
}
