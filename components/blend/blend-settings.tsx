'use client';

import { useId } from 'react';
import { subTraceStyle } from '@/components/charts';
import { MainChannelSelect } from '@/components/system/main-channel-select';
import { useSystem } from '@/components/system/system-context';
import { VoicingPicker } from '@/components/system/voicing-picker';
import { NumberField } from '@/components/ui/number-field';
import type { ApiError } from '@/lib/client/api';
import { profileById } from '@/lib/system-model/geometry';
import type { Slope, SystemDocument } from '@/lib/validations/system';
import { SlopeSelect } from './slope-select';

/** The API's error for a path field of the blend request, placed beside the control that sets it. */
function pathError(error: ApiError | undefined, pathIndex: number, field: string): string | undefined {
  return error?.field(`paths.${pathIndex}.${field}`);
}

/**
 * Blend's settings: the main channel shown (and its voicing switches), the crossover and its slopes, the mains delay, and
 * each sub's delay, gain, polarity and voicing switches, with the API's errors beside the control at fault.
 */
export function BlendSettings({ channel, onChannel, error, nearestM }: { channel: string; onChannel: (channel: string) => void; error: ApiError | undefined; nearestM: number | null }) {
  const { doc, update, readOnly } = useSystem();
  const id = useId();
  const bm = doc.bassManagement;
  const setBm = (patch: Partial<SystemDocument['bassManagement']>) => update((d) => ({ ...d, bassManagement: { ...d.bassManagement, ...patch } }));
  const speaker = doc.speakers.find((s) => s.channel === channel);
  const setSpeakerVoicing = (voicing: Record<string, string>) => update((d) => ({ ...d, speakers: d.speakers.map((s) => (s.id === speaker?.id ? { ...s, voicing } : s)) }));
  const setSub = (k: number, patch: Partial<SystemDocument['subs'][number]>) => update((d) => ({ ...d, subs: d.subs.map((s, i) => (i === k ? { ...s, ...patch } : s)) }));

  // Errors the API names: paths.0 is the mains, paths.k (k ≥ 1) sub k − 1.
  const cornerError = error?.field('crossoverHz') ?? error?.issues.find((i) => /^paths\.\d+\.filter\.cornerHz$/.test(i.path))?.message;
  const mainsSlopeError = pathError(error, 0, 'filter');
  const subSlopeError = error?.issues.find((i) => /^paths\.[1-9]\d*\.filter\.(family|order)/.test(i.path))?.message;

  return (
    <form className="flex flex-col gap-4" aria-label="Blend settings" onSubmit={(e) => e.preventDefault()}>
      <MainChannelSelect id={`${id}-channel`} label="Main channel shown" value={channel} speakers={doc.speakers} onChange={onChannel} testId="blend-channel" />
      {speaker ? <VoicingPicker profile={profileById(doc, speaker.profileId)} choice={speaker.voicing} disabled={readOnly} onChange={setSpeakerVoicing} testId="blend-mains-voicing" /> : null}
      <NumberField
        label="Crossover frequency"
        unit="Hz"
        value={bm.crossoverHz}
        min={20}
        max={300}
        step={1}
        slider
        disabled={readOnly}
        error={cornerError}
        onChange={(v) => setBm({ crossoverHz: v })}
        testId="crossover-hz"
      />
      <SlopeSelect label="Mains high-pass" value={bm.mainsHighpass} disabled={readOnly} error={mainsSlopeError} onChange={(s: Slope) => setBm({ mainsHighpass: s })} testId="mains-highpass" />
      <SlopeSelect label="Sub low-pass" value={bm.subLowpass} disabled={readOnly} error={subSlopeError} onChange={(s: Slope) => setBm({ subLowpass: s })} testId="sub-lowpass" />
      <NumberField label="Mains delay" unit="ms" value={bm.mainsDelayMs} min={0} max={100} step={0.05} digits={2} disabled={readOnly} error={pathError(error, 0, 'delayMs')} onChange={(v) => setBm({ mainsDelayMs: v })} testId="mains-delay-ms" />
      {doc.subs.map((s, k) => (
        <fieldset key={s.id} className="flex flex-col gap-2 rounded-md border border-line bg-white p-3">
          <legend className="px-1 text-sm font-medium" style={{ color: subTraceStyle(k).color }}>
            {s.name}
          </legend>
          <NumberField label="Delay" unit="ms" value={s.delayMs} min={0} max={30} step={0.05} digits={2} slider disabled={readOnly} error={pathError(error, k + 1, 'delayMs')} onChange={(v) => setSub(k, { delayMs: v })} testId={`sub-${k}-delay-ms`} />
          <NumberField label="Gain" unit="dB" value={s.gainDb} min={-30} max={30} step={0.5} digits={1} disabled={readOnly} error={pathError(error, k + 1, 'gainDb')} onChange={(v) => setSub(k, { gainDb: v })} testId={`sub-${k}-gain-db`} />
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={s.invert} disabled={readOnly} onChange={(e) => setSub(k, { invert: e.target.checked })} className="h-4 w-4 accent-sub" data-testid={`sub-${k}-invert`} />
            Invert polarity
          </label>
          {pathError(error, k + 1, 'invert') ? <p className="text-xs text-fail">{pathError(error, k + 1, 'invert')}</p> : null}
          <VoicingPicker profile={profileById(doc, s.profileId)} choice={s.voicing} disabled={readOnly} onChange={(voicing) => setSub(k, { voicing })} testId={`sub-${k}-voicing`} />
        </fieldset>
      ))}
      <p className="text-xs text-ink-faint">
        Distances come from Layout (or the measured distance on Timing). Phase and group delay are drawn relative to the first arrival at the MLP
        {nearestM !== null ? ` (${nearestM.toFixed(2)} m of air path taken off every path)` : ''}. Each speaker&apos;s natural roll-off comes from its Speaker profile.
      </p>
    </form>
  );
}
