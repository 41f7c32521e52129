import { formatNumber, formatSigned } from '@/components/charts';
import type { SubSetting } from '@/dsp';

export interface SettingsRow {
  name: string;
  present: SubSetting;
  /** What Apply writes into the System (the search's settings with the group's delay, level and polarity kept). */
  recommended: SubSetting;
  /** The search's own settings, before that mapping. */
  searched: SubSetting;
}

const polarity = (invert: boolean) => (invert ? 'inverted' : 'normal');
const changed = (a: number | boolean, b: number | boolean) => (a !== b ? 'font-semibold text-ink' : 'text-ink-soft');

/** Each sub's present and recommended delay, gain and polarity, side by side. */
export function SettingsTable({ rows }: { rows: readonly SettingsRow[] }) {
  return (
    <div className="relative overflow-x-auto" role="region" aria-label="Each sub’s present and recommended settings (scrolls sideways)" tabIndex={0}>
      <table className="w-full min-w-[28rem] border-collapse text-sm" data-testid="sb-settings">
        <caption className="pb-2 text-left text-sm text-ink-soft">Each sub: present setting → recommended (as Apply writes it to the System)</caption>
        <thead>
          <tr className="border-b border-line text-left text-xs text-ink-soft">
            <th scope="col" className="px-2 py-1.5 font-medium">Sub</th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">Delay</th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">Gain</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Polarity</th>
          </tr>
        </thead>
        <tbody className="num whitespace-nowrap">
          {rows.map((r, k) => (
            <tr key={r.name} className="border-b border-line align-top">
              <th scope="row" className="px-2 py-1.5 text-left font-sans font-medium">
                {r.name}
                <span className="block text-xs font-normal text-ink-faint">
                  search: {formatNumber(r.searched.delayMs, 2)} ms, {formatSigned(r.searched.gainDb, 'dB')}, {polarity(r.searched.invert)}
                </span>
              </th>
              <td className="px-2 py-1.5 text-right">
                <span className="text-ink-soft">{formatNumber(r.present.delayMs, 2)} →</span>{' '}
                <span className={changed(r.present.delayMs, r.recommended.delayMs)} data-testid={`sb-rec-delay-${k}`}>
                  {formatNumber(r.recommended.delayMs, 2)} ms
                </span>
              </td>
              <td className="px-2 py-1.5 text-right">
                <span className="text-ink-soft">{formatSigned(r.present.gainDb, '', 1)} →</span>{' '}
                <span className={changed(r.present.gainDb, r.recommended.gainDb)} data-testid={`sb-rec-gain-${k}`}>
                  {formatSigned(r.recommended.gainDb, 'dB', 1)}
                </span>
              </td>
              <td className="px-2 py-1.5 font-sans">
                <span className="text-ink-soft">{polarity(r.present.invert)} →</span>{' '}
                <span className={changed(r.present.invert, r.recommended.invert)} data-testid={`sb-rec-polarity-${k}`}>
                  {polarity(r.recommended.invert)}
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
