'use client';

import { useSystem } from '@/components/system/system-context';
import { NumberField } from '@/components/ui/number-field';

/** "Use a measured distance to the MLP": a checkbox that starts from the positions' distance, and the distance field. */
export function DistanceOverride({ value, defaultM, onChange }: { value: number | null; defaultM: number; onChange: (v: number | null) => void }) {
  const { units, readOnly } = useSystem();
  return (
    <div className="flex flex-col gap-1">
      <label className="inline-flex items-center gap-1.5 text-sm">
        <input type="checkbox" checked={value !== null} disabled={readOnly} onChange={(e) => onChange(e.target.checked ? Math.max(0.1, Math.round(defaultM * 100) / 100) : null)} className="accent-mains" />
        Use a measured distance to the MLP
      </label>
      {value !== null ? <NumberField label="Measured distance" value={value} min={0.1} max={100} step={0.01} onChange={(v) => onChange(v)} length units={units} unit="m" digits={2} disabled={readOnly} /> : null}
    </div>
  );
}
