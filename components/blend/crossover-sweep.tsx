'use client';

import { useId, useMemo, useState } from 'react';
import { formatHzReadout, formatNumber, formatSigned } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { MeasuredBasisPicker } from '@/components/measured/measured-basis-picker';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { DEMO_PROFILES } from '@/lib/demo/profiles';
import { useCrossoverSweep } from '@/lib/hooks/use-crossover-sweep';
import { useMeasuredBasis } from '@/lib/hooks/use-measured-basis';
import { measuredSourcesRequest, settingsForDocument, type MeasuredPicks } from '@/lib/system-model/measured-sources';
import { blendMainSpeaker } from '@/lib/system-model/system-from-document';
import { applyCrossoverSweepToDocument, crossoverSweepRequestFromDocument, type CrossoverSweepAnswerRow } from '@/lib/system-model/crossover-sweep';
import type { Slope, SpeakerProfile } from '@/lib/validations/system';
import { slopeShortName } from './slope-select';
import { SWEEP_DEFAULT_RANGE, sweepOffer } from './sweep-offer';

type Pairing = { mainsFilter: Slope; subFilter: Slope };

/** The processor settings a row runs: "mains 0.00 ms, Sub front left 1.23 ms inverted, …". */
const settingsText = (r: CrossoverSweepAnswerRow): string =>
  [`mains ${formatNumber(r.set.mainsDelayMs, 2)} ms`, ...r.set.subs.map((s) => `${s.name} ${formatNumber(s.delayMs, 2)} ms ${s.invert ? 'inverted' : 'normal'}`)].join(', ');

const LR = (order: number): Slope => ({ family: 'linkwitz-riley', order });
const BW = (order: number): Slope => ({ family: 'butterworth', order });
/** Slope pairings a sweep can try besides the System's own. */
const PAIRINGS: Pairing[] = [
  { mainsFilter: LR(4), subFilter: LR(4) },
  { mainsFilter: BW(2), subFilter: LR(4) },
  { mainsFilter: LR(2), subFilter: LR(2) },
  { mainsFilter: BW(2), subFilter: BW(2) },
  { mainsFilter: BW(3), subFilter: BW(3) },
  { mainsFilter: BW(4), subFilter: BW(4) },
  { mainsFilter: LR(8), subFilter: LR(8) },
];
const pairingKey = (p: Pairing) => `${slopeShortName(p.mainsFilter)}/${slopeShortName(p.subFilter)}`;

type SortKey = 'rank' | 'crossoverHz' | 'flatnessDb' | 'minus3DbHz' | 'shiftMs' | 'mainsLowBassDb';
const COLUMNS: { key: SortKey | null; label: string; title?: string }[] = [
  { key: 'rank', label: 'Rank' },
  { key: 'crossoverHz', label: 'Crossover' },
  { key: null, label: 'Slopes', title: 'mains high-pass / sub low-pass' },
  { key: 'flatnessDb', label: 'Flatness', title: 'largest deviation of the sum from its level at 4·fc over fc/2 … 2·fc, the whole system at this row’s delays and polarity' },
  { key: 'minus3DbHz', label: '−3 dB point', title: 'the system’s low-frequency extension at this setting' },
  { key: 'shiftMs', label: 'Sub delays', title: 'every sub’s delay moved by this (negative: the mains get the delay); the processor settings are in the row’s tooltip and on the Settings sheet after Apply' },
  { key: null, label: 'Sub polarity' },
  { key: 'mainsLowBassDb', label: 'Mains at fc/2', title: 'how much low bass the mains still carry: their level one octave below the crossover against two octaves above' },
  { key: null, label: 'Notes' },
  { key: null, label: '' },
];

/** What a row's marks mean, in words. */
function rowNotes(r: CrossoverSweepAnswerRow, lowestClearHz: number | null): string {
  const notes: string[] = [];
  if (r.present) notes.push('the present setting');
  if (r.worthIt) notes.push(r.gainDb >= 0.5 ? `${formatNumber(r.gainDb, 2)} dB flatter than the present setting` : 'clear of the mains’ roll-off, no less flat');
  if (r.nearMainsRolloff) notes.push(`below ${lowestClearHz === null ? 'the mains’ roll-off' : formatHzReadout(lowestClearHz)}: too close to the mains’ own roll-off`);
  if (!r.keepsBass) notes.push(r.extensionLossOctaves > 1 / 3 ? `raises the −3 dB point by ${formatNumber(r.extensionLossOctaves * 12, 1)} semitones` : `cuts the bass below the crossover by ${formatNumber(r.bassCutDb, 1)} dB`);
  if (!r.present && r.keepsBass && !r.worthIt && !r.nearMainsRolloff) notes.push(r.gainDb < 0 ? 'less flat than the present setting' : 'gains under 0.5 dB: not worth a change');
  return notes.join('; ');
}

function profileOptions(docProfiles: SpeakerProfile[], kind: 'main' | 'sub'): SpeakerProfile[] {
  const seen = new Set<string>();
  return [...docProfiles, ...DEMO_PROFILES].filter((p) => p.kind === kind && !seen.has(p.id) && (seen.add(p.id), true));
}

/** Crossover sweep: candidate points for one pairing (a main and a sub profile), ranked; a row applies its settings to the System. */
export function CrossoverSweep({ channel }: { channel?: string }) {
  const { doc, update, readOnly } = useSystem();
  const id = useId();
  const speaker = blendMainSpeaker(doc, channel);
  const mains = profileOptions(doc.profiles, 'main');
  const subs = profileOptions(doc.profiles, 'sub');
  const [mainsId, setMainsId] = useState(() => speaker?.profileId ?? mains[0]?.id ?? '');
  const [subId, setSubId] = useState(() => doc.subs[0]?.profileId ?? subs[0]?.id ?? '');
  const [fromHz, setFromHz] = useState<number>(SWEEP_DEFAULT_RANGE.fromHz);
  const [toHz, setToHz] = useState<number>(SWEEP_DEFAULT_RANGE.toHz);
  const [stepHz, setStepHz] = useState<number>(SWEEP_DEFAULT_RANGE.stepHz);
  const current: Pairing = { mainsFilter: doc.bassManagement.mainsHighpass, subFilter: doc.bassManagement.subLowpass };
  const choices = useMemo(() => [current, ...PAIRINGS.filter((p) => pairingKey(p) !== pairingKey(current))], [current.mainsFilter.family, current.mainsFilter.order, current.subFilter.family, current.subFilter.order]); // eslint-disable-line react-hooks/exhaustive-deps -- keyed on the slopes
  const [picked, setPicked] = useState<ReadonlySet<string>>(() => new Set([pairingKey(current), 'LR4/LR4']));
  const [sort, setSort] = useState<{ key: SortKey; descending: boolean }>({ key: 'rank', descending: false });
  const [applied, setApplied] = useState<string | null>(null);
  const [showAll, setShowAll] = useState(false);
  const sweep = useCrossoverSweep();
  const basis = useMeasuredBasis(speaker?.channel);
  // What the rows shown were ranked on (the picker may have moved since).
  const [ranOn, setRanOn] = useState<{ label: string; picks: MeasuredPicks | null }>({ label: 'the model', picks: null });

  const pairings = choices.filter((p) => picked.has(pairingKey(p)));
  // As many pairings as fit the API's row cap with this range, and the API's own words when a sweep would not fit.
  const { candidatesHz, maxPairings, limitNote, problem: rangeProblem } = sweepOffer(fromHz, toHz, stepHz, pairings.length);
  const rowsNeeded = candidatesHz.length * pairings.length;
  const mainsProfile = mains.find((p) => p.id === mainsId);
  const subProfile = subs.find((p) => p.id === subId);

  const run = () => {
    setApplied(null);
    // On measurements the speakers are what was measured: no other profile is tried in.
    const picks = basis.seat?.picks ?? null;
    const request = crossoverSweepRequestFromDocument(doc, { channel: speaker?.channel, ...(picks ? {} : { mainsProfile, subProfile }), pairings, candidatesHz });
    if (!request) return;
    setRanOn({ label: basis.label, picks });
    void sweep.run(picks ? { ...request, ...measuredSourcesRequest(doc, request, picks) } : request);
  };

  const rows = useMemo(() => {
    const sorted = [...sweep.rows];
    const { key, descending } = sort;
    const value = (r: CrossoverSweepAnswerRow): number => (key === 'shiftMs' ? Math.abs(r.shiftMs) : key === 'minus3DbHz' ? (r.assessment.minus3DbHz ?? 0) : r[key]);
    sorted.sort((a, b) => (value(a) - value(b)) * (descending ? -1 : 1));
    return sorted;
  }, [sweep.rows, sort]);

  const apply = (row: CrossoverSweepAnswerRow) => {
    // Exactly the crossover, slopes, delays and polarities the row was assessed with (and the profiles tried in).
    const present = sweep.rows.find((r) => r.present);
    const set = ranOn.picks && present ? settingsForDocument(doc, speaker?.channel, ranOn.picks, present.set, row.set) : row.set;
    update((d) => applyCrossoverSweepToDocument(d, { ...row, set }, ranOn.picks ? { channel: speaker?.channel } : { channel: speaker?.channel, mainsProfile, subProfile }));
    setApplied(`${formatHzReadout(row.crossoverHz)}, ${pairingKey(row)}, ${settingsText(row)}`);
  };
  const lowestClearHz = sweep.lowestClearHz;

  const headerSort = (key: SortKey) => setSort((s) => ({ key, descending: s.key === key ? !s.descending : false }));

  return (
    <section aria-labelledby={`${id}-title`} className="flex flex-col gap-4 rounded-lg border border-line bg-white p-4">
      <div>
        <h3 id={`${id}-title`} className="text-base font-semibold">
          Crossover sweep
        </h3>
        <p className="text-sm text-ink-soft">
          Try candidate crossover points and slopes on the whole System ({speaker?.channel ?? 'the mains'} and {doc.subs.length === 1 ? doc.subs[0]?.name : `all ${doc.subs.length} subs`}), each at the subs&apos; best delay and polarity. The present setting is a row of its own. A row ranks above it only when it keeps the −3 dB point within a third of an octave and the bass within 1 dB, is no less flat, and is either at least 0.5 dB flatter or takes a crossover that sits in the mains&apos; roll-off clear of it. Among those, rows within 0.5 dB of the flattest (too close to hear apart) come in order of the smallest change from the present setting.
        </p>
      </div>
      <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-[1fr_1fr_auto_auto_auto]">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-mains`} className="text-xs font-medium text-ink-soft">
            Main speaker profile
          </label>
          <select id={`${id}-mains`} value={mainsId} onChange={(e) => setMainsId(e.target.value)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm" data-testid="sweep-mains-profile">
            {mains.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-sub`} className="text-xs font-medium text-ink-soft">
            Sub profile
          </label>
          <select id={`${id}-sub`} value={subId} onChange={(e) => setSubId(e.target.value)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm" data-testid="sweep-sub-profile">
            {subs.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </div>
        <div className="sm:col-span-2 xl:col-span-5">
          <MeasuredBasisPicker basis={basis} testId="sweep-basis" />
        </div>
        <NumberField label="From" unit="Hz" value={fromHz} min={20} max={300} step={1} onChange={setFromHz} testId="sweep-from-hz" />
        <NumberField label="To" unit="Hz" value={toHz} min={20} max={300} step={1} onChange={setToHz} testId="sweep-to-hz" />
        <NumberField label="Step" unit="Hz" value={stepHz} min={1} max={50} step={1} onChange={setStepHz} testId="sweep-step-hz" />
      </div>
      <fieldset className="flex flex-col gap-2">
        <legend className="text-xs font-medium text-ink-soft">Slope pairings to try (mains high-pass / sub low-pass, up to {maxPairings})</legend>
        {limitNote ? (
          <p className="text-xs text-ink-soft" data-testid="sweep-pairing-limit">
            {limitNote}
          </p>
        ) : null}
        <div className="flex flex-wrap gap-2">
          {choices.map((p, i) => {
            const key = pairingKey(p);
            const on = picked.has(key);
            return (
              <label key={key} className={`flex items-center gap-2 rounded-md border px-2.5 py-1 text-sm ${on ? 'border-mains bg-tint-info' : 'border-line bg-white'}`}>
                <input
                  type="checkbox"
                  checked={on}
                  disabled={!on && pairings.length >= maxPairings}
                  onChange={() =>
                    setPicked((s) => {
                      const next = new Set(s);
                      if (next.has(key)) next.delete(key);
                      else next.add(key);
                      return next;
                    })
                  }
                  className="h-4 w-4 accent-mains"
                />
                <span className="num">{key}</span>
                {i === 0 ? <span className="text-xs text-ink-faint">(this System)</span> : null}
              </label>
            );
          })}
        </div>
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={run} disabled={Boolean(rangeProblem) || sweep.running} data-testid="sweep-run">
          {sweep.running ? 'Sweeping…' : `Run the sweep (${rowsNeeded} rows)`}
        </Button>
        {sweep.total > 0 ? (
          <div className="flex items-center gap-2 text-sm text-ink-soft">
            <progress max={sweep.total} value={sweep.done} aria-label="Crossover sweep progress" className="h-2 w-40 accent-mains" />
            <span className="num" aria-live="polite">
              {sweep.done} of {sweep.total} batches
            </span>
          </div>
        ) : null}
        {rangeProblem ? <p className="text-sm text-fail">{rangeProblem}</p> : null}
      </div>
      {sweep.error ? (
        <Notice kind="error" title="The sweep stopped">
          {sweep.error.issues[0] ? `${sweep.error.issues[0].path}: ${sweep.error.issues[0].message}` : sweep.error.message}
        </Notice>
      ) : null}
      {applied ? <Notice kind="ok">Applied to the System: {applied}.</Notice> : null}
      {rows.length ? (
        <p className="text-sm font-medium" data-testid="sweep-ran-on">
          Ranked on {ranOn.label}.{sweep.measured ? <span className="font-normal text-ink-soft"> {sweep.measured.note}</span> : null}
        </p>
      ) : null}
      {rows.length && sweep.mainsMinus3DbHz !== null && lowestClearHz !== null ? (
        <p className="text-sm text-ink-soft" data-testid="sweep-mains-rolloff">
          {speaker?.channel ?? 'The mains'} {sweep.measured ? 'measured in the room fall' : 'roll off by themselves'} {sweep.measured ? '3 dB under their 200 Hz–2 kHz level at' : 'at'} {formatHzReadout(sweep.mainsMinus3DbHz)}
          {sweep.measured ? '' : ' (−3 dB)'}; crossovers below {formatHzReadout(lowestClearHz)}, half an octave above it, are marked and ranked down (common practice).
        </p>
      ) : null}
      {rows.length ? (
        <div className="relative overflow-x-auto">
          <table className="w-full min-w-[52rem] border-collapse text-sm" data-testid="sweep-table">
            <caption className="sr-only">Crossover sweep results, {sort.key === 'rank' ? 'best first' : `sorted by ${sort.key}`}</caption>
            <thead>
              <tr className="border-b border-line text-left text-xs text-ink-soft">
                {COLUMNS.map((c, i) => (
                  <th key={i} scope="col" title={c.title} aria-sort={c.key && sort.key === c.key ? (sort.descending ? 'descending' : 'ascending') : undefined} className="px-2 py-1.5 font-medium">
                    {c.key ? (
                      <button type="button" onClick={() => headerSort(c.key as SortKey)} className="inline-flex items-center gap-1 hover:text-ink">
                        {c.label}
                        <span aria-hidden="true">{sort.key === c.key ? (sort.descending ? '▼' : '▲') : '↕'}</span>
                      </button>
                    ) : (
                      c.label
                    )}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="num whitespace-nowrap">
              {(showAll ? rows : rows.slice(0, 10)).map((r) => (
                <tr
                  key={`${pairingKey(r)}-${r.crossoverHz}-${r.present ? 'present' : 'try'}`}
                  className={`border-b border-line ${r.rank === 1 ? 'bg-tint-info' : ''} ${r.keepsBass && !r.nearMainsRolloff ? '' : 'text-ink-soft'}`}
                  data-testid={`sweep-row-${r.rank}`}
                  title={settingsText(r)}
                >
                  <td className="px-2 py-1.5">{r.rank}</td>
                  <td className="px-2 py-1.5">{formatHzReadout(r.crossoverHz)}</td>
                  <td className="px-2 py-1.5">{pairingKey(r)}</td>
                  <td className="px-2 py-1.5">±{formatNumber(r.flatnessDb, 2)} dB</td>
                  <td className="px-2 py-1.5">{r.assessment.minus3DbHz === null ? 'below 5 Hz' : formatHzReadout(r.assessment.minus3DbHz)}</td>
                  <td className="px-2 py-1.5">{r.present ? 'as set' : Math.abs(r.shiftMs) < 0.005 ? 'unchanged' : r.shiftMs > 0 ? `+${formatNumber(r.shiftMs, 2)} ms` : `mains +${formatNumber(-r.shiftMs, 2)} ms`}</td>
                  <td className="px-2 py-1.5">{r.present ? 'as set' : r.flip ? 'flip' : 'unchanged'}</td>
                  <td className="px-2 py-1.5">{formatSigned(r.mainsLowBassDb, 'dB', 1)}</td>
                  <td className="px-2 py-1.5 text-xs whitespace-normal" data-testid={`sweep-notes-${r.rank}`}>
                    {rowNotes(r, lowestClearHz)}
                  </td>
                  <td className="px-2 py-1">
                    {r.present ? (
                      <span className="text-xs text-ink-faint">kept</span>
                    ) : (
                      <Button variant="secondary" className="px-2.5 py-1" disabled={readOnly} onClick={() => apply(r)} aria-label={`Apply ${formatHzReadout(r.crossoverHz)} ${pairingKey(r)} to the System`} data-testid={`sweep-apply-${r.rank}`}>
                        Apply
                      </Button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {rows.length > 10 ? (
            <Button variant="ghost" className="mt-2" aria-expanded={showAll} onClick={() => setShowAll((v) => !v)}>
              {showAll ? 'Show the top 10 only' : `Show all ${rows.length} rows`}
            </Button>
          ) : null}
        </div>
      ) : !sweep.running ? (
        <p className="text-sm text-ink-faint">
          Default candidates: 40–150 Hz in 5 Hz steps. Each row is the whole System ({speaker?.channel ?? 'the mains'} and every sub) at that crossover, with the subs&apos; delays and polarity at their best. Rows worth a change (keeping the bass, and at least 0.5 dB flatter or clear of the mains&apos; roll-off without being less flat) rank above the present setting; a more negative &quot;Mains at fc/2&quot; means the mains carry less of the deep bass.
        </p>
      ) : null}
    </section>
  );
}
