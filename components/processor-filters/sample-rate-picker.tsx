'use client';

import { COMMON_SAMPLE_RATES_HZ, SAMPLE_RATE_LIMITS_HZ } from '@/dsp';
import { useSystem } from '@/components/system/system-context';
import { NumberField } from '@/components/ui/number-field';

const kHz = (hz: number) => `${hz / 1000} kHz`;

/** The processor's sample rate: the usual four rates as buttons, any other from 8 to 384 kHz typed (bassManagement.sampleRateHz). */
export function SampleRatePicker() {
  const { doc, update, readOnly } = useSystem();
  const rate = doc.bassManagement.sampleRateHz;
  const set = (sampleRateHz: number) => update((d) => ({ ...d, bassManagement: { ...d.bassManagement, sampleRateHz } }));
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-semibold">Processor sample rate</legend>
      <div className="flex flex-wrap items-end gap-3">
        <div role="group" aria-label="Usual sample rates" className="flex flex-wrap overflow-hidden rounded-md border border-line text-sm">
          {COMMON_SAMPLE_RATES_HZ.map((hz) => (
            <button
              key={hz}
              type="button"
              aria-pressed={rate === hz}
              disabled={readOnly}
              onClick={() => set(hz)}
              className={`num px-3 py-2 disabled:cursor-not-allowed ${rate === hz ? 'bg-ink text-white' : 'bg-white text-ink hover:bg-wash'}`}
            >
              {kHz(hz)}
            </button>
          ))}
        </div>
        <NumberField
          label="Any rate"
          unit="Hz"
          value={rate}
          onChange={set}
          min={SAMPLE_RATE_LIMITS_HZ.min}
          max={SAMPLE_RATE_LIMITS_HZ.max}
          step={100}
          digits={0}
          disabled={readOnly}
          testId="pf-sample-rate"
          className="w-40"
        />
      </div>
      <p className="text-xs text-ink-soft">The rate the processor runs its filters at (see its manual or its setup page); every coefficient below depends on it.</p>
    </fieldset>
  );
}
