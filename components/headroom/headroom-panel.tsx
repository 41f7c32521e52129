'use client';

import { useRef, useState } from 'react';
import { BarChart, ChartExportButtons, type Bar } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { useHeadroom, type HeadroomAnswer, type HeadroomRowOut } from '@/lib/hooks/use-headroom';
import { profileById } from '@/lib/system-model/geometry';
import { systemChannelSettings } from '@/lib/system-model/channel-settings';
import { formatLength } from '@/lib/units';

const statusOf = (headroomDb: number): Bar['status'] => (headroomDb >= 3 ? 'ok' : headroomDb >= 0 ? 'warn' : 'fail');
const signed = (v: number) => `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(1)}`;
const watts = (w: number) => (w >= 10000 ? `${(w / 1000).toFixed(1)} kW` : `${w >= 100 ? w.toFixed(0) : w.toFixed(1)} W`);

/** Headroom: maximum SPL at the MLP per channel and per sub against reference level, the power the target needs, and the cautions. */
export function HeadroomPanel() {
  const { doc, update, readOnly } = useSystem();
  const [mainsRoomGainDb, setMainsGain] = useState(0);
  const [subsRoomGainDb, setSubsGain] = useState(0);
  const [subSummation, setSummation] = useState<'coherent' | 'power'>('coherent');
  const { data, error, pending } = useHeadroom(doc, { mainsRoomGainDb, subsRoomGainDb, subSummation });
  const chartRef = useRef<SVGSVGElement>(null);
  const setPower = (kind: 'speaker' | 'sub', index: number, powerW: number) =>
    update((d) =>
      kind === 'speaker'
        ? { ...d, speakers: d.speakers.map((s, i) => (i === index ? { ...s, amplifierPowerW: powerW } : s)) }
        : { ...d, subs: d.subs.map((s, i) => (i === index ? { ...s, amplifierPowerW: powerW } : s)) },
    );
  const bars: Bar[] = data
    ? [
        ...data.channels.map((c) => ({ id: `ch-${c.name}`, label: c.name, value: c.maxSplDb, target: c.targetPeakDb, status: statusOf(c.headroomDb), note: c.binding === 'speaker' ? 'at its rating' : undefined })),
        ...data.subs.map((s, i) => ({ id: `sub-${i}`, label: s.name, value: s.maxSplDb, target: s.targetPeakDb, status: statusOf(s.headroomDb), note: [data.subs.length > 1 ? 'its share' : '', s.binding === 'speaker' ? 'at its rating' : ''].filter(Boolean).join(', ') || undefined })),
        ...(data.subsCombined && data.subs.length > 1 ? [{ id: 'subs', label: 'Subs together', value: data.subsCombined.maxSplDb, target: data.subsCombined.targetPeakDb, status: statusOf(data.subsCombined.headroomDb) }] : []),
      ]
    : [];
  return (
    <div className="flex flex-col gap-6" data-testid="headroom-panel">
      <Cautions data={data} />
      <section aria-labelledby="headroom-settings" className="flex flex-col gap-3">
        <h3 id="headroom-settings" className="text-base font-semibold">
          Assumptions
        </h3>
        <div className="flex flex-wrap items-end gap-4">
          <NumberField label="Room gain, mains" unit="dB" value={mainsRoomGainDb} onChange={setMainsGain} min={-20} max={30} step={0.5} digits={1} hint="0 = free field (conservative)" className="w-44" />
          <NumberField label="Room gain, subs" unit="dB" value={subsRoomGainDb} onChange={setSubsGain} min={-20} max={30} step={0.5} digits={1} hint="Small sealed rooms often add several dB" className="w-48" />
          <fieldset className="flex flex-col gap-1 text-sm">
            <legend className="text-xs font-medium text-ink-soft">Several subs add</legend>
            <label className="inline-flex items-center gap-1.5">
              <input type="radio" name="sub-summation" checked={subSummation === 'coherent'} onChange={() => setSummation('coherent')} className="accent-mains" /> in phase (+6 dB per doubling)
            </label>
            <label className="inline-flex items-center gap-1.5">
              <input type="radio" name="sub-summation" checked={subSummation === 'power'} onChange={() => setSummation('power')} className="accent-mains" /> as power (+3 dB per doubling)
            </label>
          </fieldset>
        </div>
        <p className="text-xs text-ink-soft">
          Targets: {data?.channelTargetPeakDb ?? 105} dB SPL peaks per channel (85 dB reference at −20 dBFS, SMPTE RP 200) and {data?.subTargetPeakDb ?? 115} dB from the subs (LFE +10 dB in-band, common practice). Max SPL = sensitivity + 10·log10(power) − 20·log10(distance), free field, plus the room gain, at the lower of the amplifier’s power and the speaker’s rating.
        </p>
      </section>
      {error ? <Notice kind="error">{error.message}</Notice> : null}
      {data ? (
        <section aria-labelledby="headroom-chart" aria-busy={pending} className="flex flex-col gap-2">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h3 id="headroom-chart" className="text-base font-semibold">
              Maximum SPL at the MLP
            </h3>
            <ChartExportButtons
              svgRef={chartRef}
              filename="headroom"
              subject="headroom chart"
              csv={() => ['name,maxSplDb,binding,amplifierSplDb,ratedSplDb,targetPeakDb,headroomDb,powerW,ratedPowerW,powerNeededW', ...[...data.channels, ...data.subs].map((r) => `${r.name},${r.maxSplDb},${r.binding},${r.amplifierSplDb},${r.ratedSplDb ?? ''},${r.targetPeakDb},${r.headroomDb},${r.powerW},${r.ratedPowerW ?? ''},${r.powerNeededW}`)].join('\n')}
            />
          </div>
          <BarChart ref={chartRef} bars={bars} title="Maximum SPL at the MLP against the target" description="Each channel's and sub's maximum SPL at the main listening position; the dashed tick is its target peak (105 dB per channel, 115 dB from the subs together)." unit="dB SPL" valueLabel="Maximum SPL at the MLP" />
          <p className="text-xs text-ink-soft">Green: 3 dB or more to spare · amber: meets the target with under 3 dB · red: short of the target.</p>
        </section>
      ) : (
        <p className="text-sm text-ink-soft">{pending ? 'Computing…' : 'Add speakers or subs to check their headroom.'}</p>
      )}
      {data ? <RatingLimit data={data} /> : null}
      {data ? <HeadroomTable data={data} onPower={setPower} readOnly={readOnly} /> : null}
      {data ? <Exposure data={data} /> : null}
      <p className="text-xs text-ink-soft">Sensitivity, impedance and rating come from each speaker’s profile ({doc.profiles.map((p) => p.name).join(' · ')}); the amplifier power is per speaker and per sub.</p>
    </div>
  );
}

/** Channels whose amplifier is above the speaker's rating: the rating binds, and the verdict is taken there. */
function RatingLimit({ data }: { data: HeadroomAnswer }) {
  const limited = [...data.channels, ...data.subs].filter((r) => r.binding === 'speaker');
  if (!limited.length) return null;
  // One line per amplifier and rating, the channels that share them named together.
  const groups = new Map<string, HeadroomRowOut[]>();
  for (const r of limited) groups.set(`${r.powerW}/${r.usablePowerW}`, [...(groups.get(`${r.powerW}/${r.usablePowerW}`) ?? []), r]);
  return (
    <Notice kind="warn" title="The speaker’s rating is the limit">
      <p data-testid="headroom-rating-limit">
        {[...groups.values()]
          .map((rows) => `${rows.map((r) => r.name).join(', ')}: amplifier ${watts(rows[0]!.powerW)} on a ${watts(rows[0]!.usablePowerW)} rating, so ${(rows[0]!.amplifierSplDb - rows[0]!.maxSplDb).toFixed(1)} dB less than the full amplifier would give`)
          .join('; ')}
        .
      </p>
      <p className="mt-1">
        Maximum SPL, the bars and the headroom are taken at the rating (the table shows both figures). Turn the amplifier’s gain down or set a limiter so the speaker never gets more than its rating; the speaker maker’s ratings and instructions come first.
      </p>
    </Notice>
  );
}

function Cautions({ data }: { data: HeadroomAnswer | undefined }) {
  return (
    <div className="grid gap-3 md:grid-cols-2" data-testid="headroom-cautions">
      <Notice kind="warn" title="Hearing safety">
        <p>Reference-level peaks (105 dB per channel, 115 dB from the subs) can damage hearing. Calibrate with the −20 dBFS test signal at 85 dB SPL, never at full scale; wear hearing protection for level sweeps and stress tests and warn everyone in the room first.</p>
        <p className="mt-1">NIOSH recommends no more than 85 dBA over 8 hours, with a 3 dB exchange rate: each 3 dB more halves the safe time — 100 dBA for 15 minutes a day (NIOSH, Criteria for a Recommended Standard: Occupational Noise Exposure, 1998).</p>
      </Notice>
      <Notice kind="warn" title="Installation">
        <p>Mounting speakers and subs on walls or ceilings, and any electrical work such as dedicated circuits or in-wall wiring, must follow local building and electrical codes: use rated hardware fixed into structure, and a licensed professional where the codes require one.</p>
        <p className="mt-1">Power above a speaker’s rating can destroy its drivers; the power-needed figures assume clean peaks and are no licence to exceed the rating.</p>
        {data ? <p className="sr-only">{data.safety.length} cautions from the computation are listed above.</p> : null}
      </Notice>
    </div>
  );
}

function HeadroomTable({ data, onPower, readOnly }: { data: HeadroomAnswer; onPower: (kind: 'speaker' | 'sub', index: number, powerW: number) => void; readOnly: boolean }) {
  const { doc, units } = useSystem();
  // Distances as the Settings sheet and Layout give them (0.01 m), document order.
  const settings = systemChannelSettings(doc);
  const row = (r: HeadroomRowOut, kind: 'speaker' | 'sub', index: number) => {
    const item = kind === 'speaker' ? doc.speakers[index] : doc.subs[index];
    const distanceM = (kind === 'speaker' ? settings.mains[index] : settings.subs[index])?.distanceM;
    const profile = item ? profileById(doc, item.profileId) : undefined;
    const status = statusOf(r.headroomDb);
    return (
      <tr key={`${kind}-${index}`} className="border-t border-line align-top">
        <th scope="row" className={`px-2 py-1.5 text-left font-semibold ${kind === 'sub' ? 'text-sub' : ''}`}>
          {r.name}
          {kind === 'sub' && item && 'count' in item && item.count > 1 ? <span className="block text-xs font-normal text-ink-soft">{item.count} units</span> : null}
        </th>
        <td className="num px-2 py-1.5 text-right text-xs">
          {profile ? `${profile.sensitivityDb} dB/${profile.sensitivityReference === '1W' ? '1 W' : '2.83 V'}` : '—'}
          <span className="block text-ink-soft">{profile ? `${profile.impedanceOhm} Ω · ${r.sensitivity1WDb.toFixed(1)} dB/1 W` : ''}</span>
        </td>
        <td className="px-2 py-1.5">
          <NumberField label={`${r.name} power`} unit="W" value={r.powerW} min={1} max={20000} step={10} onChange={(v) => onPower(kind, index, v)} disabled={readOnly} testId={`power-${r.name}`} className="w-32" />
        </td>
        <td className="num px-2 py-1.5 text-right">{item && distanceM !== undefined ? formatLength(distanceM, units) : '—'}</td>
        <td className="num px-2 py-1.5 text-right" data-testid={`max-spl-${r.name}`}>
          <span className="font-semibold">{r.maxSplDb.toFixed(1)} dB</span>
          {r.ratedSplDb !== null ? (
            <span className="block text-xs text-ink-soft" data-testid={`max-spl-detail-${r.name}`}>
              amplifier {r.amplifierSplDb.toFixed(1)} · rating {r.ratedSplDb.toFixed(1)}
            </span>
          ) : null}
        </td>
        <td className="px-2 py-1.5 text-xs" data-testid={`binding-${r.name}`}>
          {r.binding === 'speaker' ? (
            <span className="font-semibold text-warn">Speaker rating ({watts(r.usablePowerW)})</span>
          ) : (
            <span>Amplifier ({watts(r.powerW)})</span>
          )}
        </td>
        <td className="num px-2 py-1.5 text-right">{r.targetPeakDb.toFixed(1)} dB</td>
        <td className={`num px-2 py-1.5 text-right font-semibold ${status === 'fail' ? 'text-fail' : status === 'warn' ? 'text-warn' : 'text-ok'}`}>
          {r.meetsTarget ? `${signed(r.headroomDb)} dB` : `${r.deficitDb.toFixed(1)} dB short`}
        </td>
        <td className="num px-2 py-1.5 text-right">
          {watts(r.powerNeededW)}
          {r.exceedsRatedPower ? <span className="block text-xs text-fail">above the {profile?.ratedPowerW} W rating</span> : null}
          {r.amplifierAboveRating ? <span className="block text-xs text-warn">amplifier above the {profile?.ratedPowerW} W rating</span> : null}
        </td>
      </tr>
    );
  };
  return (
    <section aria-labelledby="headroom-table" className="flex flex-col gap-2">
      <h3 id="headroom-table" className="text-base font-semibold">
        Per channel and per sub
      </h3>
      <div className="relative overflow-x-auto rounded-md border border-line bg-white">
        <table className="w-full min-w-[60rem] text-sm" data-testid="headroom-table">
          <caption className="sr-only">Maximum SPL at the MLP at the binding limit (the amplifier, or the speaker’s rating when the amplifier is above it), which limit binds, target, headroom or deficit and power needed for each channel and sub</caption>
          <thead className="bg-paper text-left text-ink-soft">
            <tr>
              <th scope="col" className="px-2 py-1.5 font-medium">Channel</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Sensitivity</th>
              <th scope="col" className="px-2 py-1.5 font-medium">Amplifier</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">To MLP</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Max SPL</th>
              <th scope="col" className="px-2 py-1.5 font-medium">Limited by</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Target</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Headroom</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Power for target</th>
            </tr>
          </thead>
          <tbody>
            {data.channels.map((r, i) => row(r, 'speaker', i))}
            {data.subs.map((r, i) => row(r, 'sub', i))}
            {data.subsCombined && data.subs.length > 1 ? (
              <tr className="border-t-2 border-line">
                <th scope="row" className="px-2 py-1.5 text-left font-semibold text-sub">
                  Subs together
                </th>
                <td colSpan={3} className="px-2 py-1.5 text-xs text-ink-soft">
                  {data.subsCombined.summation === 'coherent' ? 'in phase at the MLP' : 'added as power'}; each sub above is held to its share of {data.subsCombined.targetPeakDb} dB
                </td>
                <td className="num px-2 py-1.5 text-right font-semibold">{data.subsCombined.maxSplDb.toFixed(1)} dB</td>
                <td className="px-2 py-1.5 text-xs text-ink-soft">each sub’s own limit</td>
                <td className="num px-2 py-1.5 text-right">{data.subsCombined.targetPeakDb.toFixed(1)} dB</td>
                <td className={`num px-2 py-1.5 text-right font-semibold ${data.subsCombined.meetsTarget ? 'text-ok' : 'text-fail'}`}>
                  {data.subsCombined.meetsTarget ? `${signed(data.subsCombined.headroomDb)} dB` : `${(-data.subsCombined.headroomDb).toFixed(1)} dB short`}
                </td>
                <td className="num px-2 py-1.5 text-right text-xs">× {data.subsCombined.powerScale.toFixed(2)} each</td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </section>
  );
}

function Exposure({ data }: { data: HeadroomAnswer }) {
  return (
    <details className="rounded-md border border-line bg-white px-3 py-2 text-sm">
      <summary className="cursor-pointer font-medium">Permissible daily exposure (NIOSH, 85 dBA / 8 h, 3 dB exchange)</summary>
      <table className="num mt-2 text-sm">
        <thead className="text-ink-soft">
          <tr>
            <th scope="col" className="pr-6 text-left font-medium">Level</th>
            <th scope="col" className="text-right font-medium">Time per day</th>
          </tr>
        </thead>
        <tbody>
          {data.exposure.map((e) => (
            <tr key={e.levelDba}>
              <td className="pr-6">{e.levelDba} dBA</td>
              <td className="text-right">{e.minutes >= 60 ? `${(e.minutes / 60).toFixed(e.minutes % 60 ? 1 : 0)} h` : e.minutes >= 1 ? `${e.minutes.toFixed(e.minutes < 10 ? 1 : 0)} min` : `${Math.round(e.minutes * 60)} s`}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </details>
  );
}
