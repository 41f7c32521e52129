'use client';

import { NumberField } from '@/components/ui/number-field';
import type { SeatBalanceLimits } from '@/dsp';

export interface PlacementOption {
  enabled: boolean;
  count: number;
}

interface LimitsFormProps {
  limits: SeatBalanceLimits;
  onLimits: (limits: SeatBalanceLimits) => void;
  placement: PlacementOption;
  onPlacement: (p: PlacementOption) => void;
  /** The most subs a placement may ask for (the candidate spots and the API's limit). */
  maxCount: number;
  /** Messages by request path ("limits.maxDelayMs", "placement.count") from the request schema. */
  errors: ReadonlyMap<string, string>;
  disabled: boolean;
  /** When set, positions cannot be ranked (a measured run): this says why, in place of the option. */
  placementNote?: string | null;
}

/** The box the search stays in, and whether to rank positions too. Every value is checked by the request's schema. */
export function LimitsForm({ limits, onLimits, placement, onPlacement, maxCount, errors, disabled, placementNote = null }: LimitsFormProps) {
  const set = (patch: Partial<SeatBalanceLimits>) => onLimits({ ...limits, ...patch });
  return (
    <form className="flex flex-col gap-3" aria-label="Seat balance limits" onSubmit={(e) => e.preventDefault()}>
      <h3 className="text-base font-semibold">Limits</h3>
      <NumberField label="Largest sub delay" unit="ms" value={limits.maxDelayMs} min={0} max={50} step={1} digits={1} disabled={disabled} error={errors.get('limits.maxDelayMs')} onChange={(v) => set({ maxDelayMs: v })} testId="sb-max-delay" />
      <div className="grid grid-cols-2 gap-2">
        <NumberField label="Lowest gain" unit="dB" value={limits.minGainDb} min={-30} max={0} step={1} digits={1} disabled={disabled} error={errors.get('limits.minGainDb')} onChange={(v) => set({ minGainDb: v })} testId="sb-min-gain" />
        <NumberField label="Highest gain" unit="dB" value={limits.maxGainDb} min={0} max={12} step={1} digits={1} disabled={disabled} error={errors.get('limits.maxGainDb')} onChange={(v) => set({ maxGainDb: v })} testId="sb-max-gain" />
      </div>
      <NumberField
        label="Most output given up"
        unit="dB"
        value={limits.maxOutputLossDb}
        min={0}
        max={20}
        step={0.5}
        digits={1}
        disabled={disabled}
        error={errors.get('limits.maxOutputLossDb')}
        hint="How far the seats' mean level may fall below every sub in phase at 0 ms and 0 dB."
        onChange={(v) => set({ maxOutputLossDb: v })}
        testId="sb-max-loss"
      />
      <label className="inline-flex items-center gap-2 text-sm">
        <input type="checkbox" checked={limits.allowInvert} disabled={disabled} onChange={(e) => set({ allowInvert: e.target.checked })} className="accent-mains" data-testid="sb-allow-invert" />
        Allow inverting a sub&apos;s polarity
      </label>
      <fieldset className="flex flex-col gap-2 rounded-md border border-line bg-white p-3">
        <legend className="px-1 text-sm font-medium">Positions</legend>
        {placementNote ? (
          <p className="text-sm text-ink-soft">{placementNote}</p>
        ) : (
          <label className="inline-flex items-center gap-2 text-sm">
            <input type="checkbox" checked={placement.enabled} disabled={disabled} onChange={(e) => onPlacement({ ...placement, enabled: e.target.checked })} className="accent-mains" data-testid="sb-rank-positions" />
            Also rank positions
          </label>
        )}
        {placement.enabled && !placementNote ? (
          <NumberField
            label="Subs to place"
            value={placement.count}
            min={1}
            max={maxCount}
            step={1}
            disabled={disabled}
            error={errors.get('placement.count')}
            hint="Among the four floor corners and four wall midpoints, 0.25 m from the walls."
            onChange={(v) => onPlacement({ ...placement, count: Math.round(v) })}
            testId="sb-placement-count"
          />
        ) : null}
      </fieldset>
    </form>
  );
}
