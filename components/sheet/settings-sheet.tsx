import type { ReactNode } from 'react';
import { computeSettingsSheet, SETTING_DECIMALS } from '@/lib/system-model/settings-sheet';
import { formatLength } from '@/lib/units';
import type { SystemDocument } from '@/lib/validations/system';
import { ProcessorFiltersSection } from './processor-filters-section';
import { SeatBalanceSection } from './seat-balance-section';

interface Props {
  name: string;
  revision: number;
  /** The note saved with the revision shown ("moved subs to the front corners"), if any. */
  revisionNote?: string | null;
  /** ISO time of the revision shown. */
  savedAt: string;
  savedBy?: string | null;
  workspaceName?: string;
  document: SystemDocument;
  /** "Printed" date for the footer; defaults to savedAt. */
  printedAt?: string;
}

const f = (x: number, digits: number) => x.toFixed(digits);
const signed = (x: number, digits: number) => `${x > 0 ? '+' : x < 0 ? '−' : ''}${Math.abs(x).toFixed(digits)}`;
const feet = (m: number) => formatLength(m, 'imperial');
const D = SETTING_DECIMALS;
/** A column's plain meaning under its heading. */
const Meaning = ({ children }: { children: string }) => <span className="block max-w-40 text-[0.7rem] font-normal normal-case leading-tight tracking-normal">{children}</span>;

/** A settings table that scrolls sideways on a narrow screen, with its head row (see SheetHead). */
function SheetTable({ columns, children }: { columns: Parameters<typeof SheetHead>[0]['columns']; children: ReactNode }) {
  return (
    <div className="relative overflow-x-auto">
      <table className="sheet-table w-full text-left text-sm">
        <SheetHead columns={columns} />
        {children}
      </table>
    </div>
  );
}

/** The head row of a settings table: numbers right-aligned, and a column's meaning in small type under its name. */
function SheetHead({ columns }: { columns: readonly { label: string; right?: boolean; meaning?: string }[] }) {
  return (
    <thead>
      <tr className="border-b border-ink text-xs uppercase tracking-wide text-ink-faint">
        {columns.map((c, i) => (
          <th key={c.label} scope="col" className={['py-1.5', i < columns.length - 1 ? 'pr-3' : '', c.right ? 'text-right' : '', c.meaning ? 'align-bottom' : ''].filter(Boolean).join(' ')}>
            {c.label}
            {c.meaning ? <Meaning>{c.meaning}</Meaning> : null}
          </th>
        ))}
      </tr>
    </thead>
  );
}

/**
 * The printable Settings sheet: the processor settings per channel and per sub, the
 * room-mode summary and notes, dated and with the revision. A pure render of the document, so the
 * editor, the Library and the shared page print the same thing.
 */
export function SettingsSheet({ name, revision, revisionNote, savedAt, savedBy, workspaceName, document, printedAt }: Props) {
  const sheet = computeSettingsSheet(document);
  return (
    <article className="settings-sheet mx-auto flex max-w-[60rem] flex-col gap-5 rounded-lg border border-line bg-white p-5 text-ink sm:p-8" aria-labelledby="sheet-title">
      <header className="flex flex-wrap items-start gap-x-6 gap-y-2 border-b-2 border-ink pb-3">
        <div className="min-w-[min(100%,16rem)] flex-1">
          <p className="text-xs font-semibold uppercase tracking-[0.14em] text-ink-faint">Seamline · Settings sheet</p>
          <h1 id="sheet-title" className="break-words text-2xl font-semibold">
            {name}
          </h1>
          {workspaceName ? <p className="text-sm text-ink-soft">{workspaceName}</p> : null}
        </div>
        <dl className="num grid grid-cols-[auto_auto] gap-x-3 text-sm">
          <dt className="text-ink-faint">Revision</dt>
          <dd data-testid="sheet-revision">{revision}</dd>
          {revisionNote ? (
            <>
              <dt className="text-ink-faint">Note</dt>
              <dd className="max-w-64 break-words font-sans" data-testid="sheet-revision-note">
                {revisionNote}
              </dd>
            </>
          ) : null}
          <dt className="text-ink-faint">Saved</dt>
          <dd>
            <time dateTime={savedAt}>{savedAt.slice(0, 10)}</time>
            {savedBy ? <span className="font-sans"> · {savedBy}</span> : null}
          </dd>
          <dt className="text-ink-faint">Layout</dt>
          <dd>{sheet.layout}</dd>
        </dl>
      </header>

      <section aria-labelledby="sheet-bm" className="sheet-block">
        <h2 id="sheet-bm" className="mb-2 text-base font-semibold">
          Bass management
        </h2>
        <dl className="num grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
          <div>
            <dt className="font-sans text-xs text-ink-faint">Crossover</dt>
            <dd className="text-lg">{f(sheet.crossoverHz, 0)} Hz</dd>
          </div>
          <div>
            <dt className="font-sans text-xs text-ink-faint">LFE low-pass</dt>
            <dd className="text-lg">{f(sheet.lfeLowpassHz, 0)} Hz</dd>
          </div>
          <div>
            <dt className="font-sans text-xs text-ink-faint">LFE gain</dt>
            <dd className="text-lg">{signed(sheet.lfeGainDb, 1)} dB</dd>
          </div>
          <div>
            <dt className="font-sans text-xs text-ink-faint">Air temperature</dt>
            <dd className="text-lg">{f(sheet.temperatureC, 0)} °C</dd>
          </div>
        </dl>
      </section>

      <section aria-labelledby="sheet-channels" className="sheet-block">
        <h2 id="sheet-channels" className="mb-2 text-base font-semibold">
          Main channels <span className="text-sm font-normal text-ink-faint">(distances to {sheet.mlpName})</span>
        </h2>
        {sheet.channels.length ? (
          <SheetTable
            columns={[
              { label: 'Channel' },
              { label: 'Distance', right: true },
              { label: 'Delay', right: true, meaning: 'distance alignment plus the mains delay' },
              { label: 'Trim', right: true, meaning: 'level match by distance plus the channel’s offset' },
              { label: 'High-pass', right: true },
              { label: 'Slope' },
            ]}
          >
            <tbody className="num [&_td]:whitespace-nowrap">
              {sheet.channels.map((c) => (
                <tr key={c.id} className="border-b border-line">
                  <th scope="row" className="py-1.5 pr-3 font-sans font-semibold">
                    {c.channel}
                    <span className="block text-xs font-normal text-ink-faint">{c.profileName}</span>
                  </th>
                  <td className="py-1.5 pr-3 text-right" data-testid={`sheet-distance-${c.channel}`}>
                    {f(c.distanceM, D.distanceM)} m<span className="block text-xs text-ink-faint">{feet(c.distanceM)}{c.distanceSource === 'measured' ? ' · measured' : ''}</span>
                  </td>
                  <td className="py-1.5 pr-3 text-right" data-testid={`sheet-delay-${c.channel}`}>{f(c.delayMs, D.delayMs)} ms</td>
                  <td className="py-1.5 pr-3 text-right" data-testid={`sheet-trim-${c.channel}`}>
                    {signed(c.trimDb, D.trimDb)} dB
                    {c.offsetDb !== 0 ? <span className="block text-xs text-ink-faint">offset {signed(c.offsetDb, D.trimDb)} dB</span> : null}
                  </td>
                  <td className="py-1.5 pr-3 text-right">{f(c.highpassHz, 0)} Hz</td>
                  <td className="py-1.5 font-sans text-xs">{c.slope}</td>
                </tr>
              ))}
            </tbody>
          </SheetTable>
        ) : (
          <p className="text-sm text-ink-soft">No main speakers in this System.</p>
        )}
        <p className="mt-1.5 text-xs text-ink-faint">
          Delay: distance alignment to the farthest speaker or sub, plus the mains delay ({f(sheet.mainsDelayMs, D.delayMs)} ms); the delay every channel and sub shares is taken out, so the
          smallest is 0 ms. Trim: level match by distance (inverse-square law, free field) plus the channel’s offset; a level match measured with a meter at the listening position
          supersedes it. Rounded to what a processor takes: 0.01 m, 0.01 ms, 0.1 dB.
        </p>
      </section>

      <section aria-labelledby="sheet-subs" className="sheet-block">
        <h2 id="sheet-subs" className="mb-2 text-base font-semibold">
          Subwoofers
        </h2>
        {sheet.subs.length ? (
          <SheetTable
            columns={[
              { label: 'Sub' },
              { label: 'Distance', right: true },
              { label: 'Delay', right: true, meaning: 'distance alignment plus the sub’s own delay' },
              { label: 'Polarity' },
              { label: 'Gain', right: true },
              { label: 'Low-pass', right: true },
              { label: 'Slope' },
            ]}
          >
            <tbody className="num [&_td]:whitespace-nowrap">
              {sheet.subs.map((s) => (
                <tr key={s.id} className="border-b border-line">
                  <th scope="row" className="py-1.5 pr-3 font-sans font-semibold">
                    {s.name}
                    {s.count > 1 ? ` ×${s.count}` : ''}
                    <span className="block text-xs font-normal text-ink-faint">{s.profileName}</span>
                  </th>
                  <td className="py-1.5 pr-3 text-right" data-testid={`sheet-sub-distance-${s.id}`}>
                    {f(s.distanceM, D.distanceM)} m<span className="block text-xs text-ink-faint">{feet(s.distanceM)}{s.distanceSource === 'measured' ? ' · measured' : ''}</span>
                  </td>
                  <td className="py-1.5 pr-3 text-right" data-testid={`sheet-sub-delay-${s.id}`}>
                    {f(s.delayMs, D.delayMs)} ms
                    {s.ownDelayMs !== 0 ? <span className="block text-xs text-ink-faint">own delay {f(s.ownDelayMs, D.delayMs)} ms</span> : null}
                  </td>
                  <td className={`py-1.5 pr-3 font-sans ${s.polarity === 'inverted' ? 'font-semibold text-sub' : ''}`}>{s.polarity === 'inverted' ? 'Inverted (180°)' : 'Normal'}</td>
                  <td className="py-1.5 pr-3 text-right" data-testid={`sheet-sub-gain-${s.id}`}>
                    {signed(s.gainDb, D.trimDb)} dB
                  </td>
                  <td className="py-1.5 pr-3 text-right">{f(s.lowpassHz, 0)} Hz</td>
                  <td className="py-1.5 font-sans text-xs">{s.slope}</td>
                </tr>
              ))}
            </tbody>
          </SheetTable>
        ) : (
          <p className="text-sm text-ink-soft">No subwoofers in this System.</p>
        )}
      </section>

      <SeatBalanceSection sheet={sheet} />

      <ProcessorFiltersSection sheet={sheet} />

      <section aria-labelledby="sheet-modes" className="sheet-block">
        <h2 id="sheet-modes" className="mb-2 text-base font-semibold">
          Room and modes
        </h2>
        <dl className="num grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
          <div>
            <dt className="font-sans text-xs text-ink-faint">Room (L × W × H)</dt>
            <dd>
              {f(sheet.room.lengthM, 2)} × {f(sheet.room.widthM, 2)} × {f(sheet.room.heightM, 2)} m
            </dd>
          </div>
          <div>
            <dt className="font-sans text-xs text-ink-faint">Volume · RT60</dt>
            <dd>
              {f(sheet.room.volumeM3, 1)} m³ · {f(sheet.room.rt60S, 2)} s
            </dd>
          </div>
          <div>
            <dt className="font-sans text-xs text-ink-faint">Schroeder frequency</dt>
            <dd data-testid="sheet-schroeder">{f(sheet.schroederHz, 0)} Hz</dd>
          </div>
          <div>
            <dt className="font-sans text-xs text-ink-faint">First axial (L / W / H)</dt>
            <dd>
              {[sheet.firstAxialHz.length, sheet.firstAxialHz.width, sheet.firstAxialHz.height].map((x) => (x === null ? '—' : f(x, 1))).join(' / ')} Hz
            </dd>
          </div>
        </dl>
        <table className="sheet-table mt-2 w-full max-w-md text-left text-sm">
          <caption className="mb-1 text-left text-xs text-ink-faint">The lowest modes of the rectangular room (indices along length, width, height)</caption>
          <thead>
            <tr className="border-b border-ink text-xs uppercase tracking-wide text-ink-faint">
              <th scope="col" className="py-1 pr-3 text-right">Frequency</th>
              <th scope="col" className="py-1 pr-3">Indices</th>
              <th scope="col" className="py-1">Kind</th>
            </tr>
          </thead>
          <tbody className="num [&_td]:whitespace-nowrap">
            {sheet.firstModes.map((m) => (
              <tr key={m.indices.join('-')} className="border-b border-line">
                <td className="py-1 pr-3 text-right">{f(m.frequencyHz, 1)} Hz</td>
                <td className="py-1 pr-3">({m.indices.join(', ')})</td>
                <td className="py-1 font-sans">{m.kind}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-labelledby="sheet-notes" className="sheet-block">
        <h2 id="sheet-notes" className="mb-2 text-base font-semibold">
          Notes
        </h2>
        {sheet.notes.trim() ? <p className="whitespace-pre-wrap wrap-anywhere text-sm">{sheet.notes}</p> : <p className="text-sm text-ink-faint">No notes.</p>}
      </section>

      <footer className="border-t border-line pt-2 text-xs text-ink-faint">
        Revision {revision} of “{name}”, saved <time dateTime={savedAt}>{savedAt.slice(0, 16).replace('T', ' ')} UTC</time>
        {printedAt ? <> · printed {printedAt.slice(0, 10)}</> : null}. Playback levels: build up gradually and protect hearing; amplifier, mounting and electrical work follow the
        equipment’s instructions, local codes and licensed practice.
      </footer>
    </article>
  );
}
