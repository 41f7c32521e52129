'use client';

import { useId } from 'react';
import type { MeasuredBasisState } from '@/lib/hooks/use-measured-basis';

/**
 * The one control that runs a decision (Timing, the Crossover sweep) on the model or on what was measured at a seat,
 * with the files it uses and what is missing said in words.
 */
export function MeasuredBasisPicker({ basis, testId }: { basis: MeasuredBasisState; testId: string }) {
  const id = useId();
  const { seat, seats, gaps, unavailable } = basis;
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        Run on
      </label>
      <select
        id={id}
        value={seat?.seat ?? ''}
        onChange={(e) => basis.choose(e.target.value || null)}
        disabled={seats.length === 0}
        className="w-full min-w-0 rounded-md border border-line bg-white px-2 py-1.5 text-sm disabled:text-ink-faint"
        data-testid={testId}
      >
        <option value="">The model (speakers, distances and room as entered)</option>
        {seats.map((s) => (
          <option key={s.seat} value={s.seat}>
            Measured at {s.seat}
          </option>
        ))}
      </select>
      <p className="max-w-2xl text-xs text-ink-faint" data-testid={`${testId}-detail`}>
        {seat
          ? `Measurements: ${seat.files}. The System's filters, processor EQ, gains, delays and polarity are applied to them; the speakers' roll-off, voicing switches, distances and the room are what was measured.`
          : (unavailable ?? (gaps.length ? `Not usable: ${gaps.join('; ')}.` : null))}
      </p>
    </div>
  );
}
