import { formatNumber, formatSigned } from '@/components/charts';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';
import type { SettingsRow } from './settings-table';

/** Seat balance offers Apply only when the recommendation is at least this much below the present mean spread, dB. */
const APPLY_MIN_GAIN_DB = 0.1;

interface ApplyBoxProps {
  answer: SeatBalanceAnswer;
  rows: readonly SettingsRow[];
  /** The System changed since the run (its seats, subs, room or present settings). */
  stale: boolean;
  readOnly: boolean;
  /** Set after Apply: what was written, for the note and Undo. */
  applied: boolean;
  onApply: () => void;
  onUndo: () => void;
}

/** Apply to System (or why not), the undo of the last apply, and the cautions about level that go with it. */
export function ApplyBox({ answer, rows, stale, readOnly, applied, onApply, onUndo }: ApplyBoxProps) {
  const present = answer.present ?? answer.before;
  // The figures are rounded to 0.01 dB: compare the difference, with room for the binary fraction's last bit.
  const worthIt = present.meanSpreadDb - answer.after.meanSpreadDb >= APPLY_MIN_GAIN_DB - 1e-9;
  const boosts = rows.filter((r) => r.recommended.gainDb > r.present.gainDb && r.recommended.gainDb > 0);
  return (
    <section aria-labelledby="sb-apply" className="flex flex-col gap-2">
      <h3 id="sb-apply" className="text-base font-semibold">
        Apply
      </h3>
      {applied ? (
        <Notice kind="ok" title="Applied to the System">
          <p>Each sub&apos;s delay, gain and polarity are now the recommended ones; Timing and the Settings sheet show them. Save to keep them.</p>
          <Button variant="secondary" className="mt-2" onClick={onUndo} data-testid="sb-undo">
            Undo
          </Button>
        </Notice>
      ) : !worthIt ? (
        <Notice kind="info" title="The present settings are as good as it gets within these limits" >
          The best the search found ({formatNumber(answer.after.meanSpreadDb, 2)} dB mean spread) is not at least {formatNumber(APPLY_MIN_GAIN_DB, 1)} dB below the present {formatNumber(present.meanSpreadDb, 2)} dB, so there is nothing worth changing.
          Wider limits (a longer delay, more gain range, inversion, more output given up) or other sub positions may do better.
        </Notice>
      ) : stale ? (
        <Notice kind="warn">The System changed since this run; run Seat balance again before applying.</Notice>
      ) : readOnly ? (
        <p className="text-sm text-ink-soft">Read only: a viewer cannot change the System.</p>
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={onApply} data-testid="sb-apply">
            Apply to System
          </Button>
          <p className="text-sm text-ink-soft">
            Mean spread {formatNumber(present.meanSpreadDb, 2)} → {formatNumber(answer.after.meanSpreadDb, 2)} dB. One change: Undo puts the present settings back.
          </p>
        </div>
      )}
      <p className="text-xs text-ink-soft">
        Apply keeps the subs&apos; mean delay where it can (no delay goes below 0 ms) and their level at the seats (one gain change for every sub), as those are Timing&apos;s and the level match&apos;s, and flips every sub together where that keeps more of the present polarities: none of that changes the spread between seats.
      </p>
      {boosts.length ? (
        <Notice kind="warn" title="A gain boost needs headroom">
          {boosts.map((r) => `${r.name} ${formatSigned(r.recommended.gainDb, 'dB')}`).join(', ')}: check on Headroom that the amplifier and the driver can give the extra level before you set it.
        </Notice>
      ) : null}
      <p className="text-xs text-ink-faint">Keep levels safe: after a change, start playback low and raise it gradually, and protect your hearing.</p>
    </section>
  );
}
