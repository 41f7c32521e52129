import { formatNumber, formatSigned } from '@/components/charts';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import type { EqDesignAnswer } from '@/lib/system-model/eq-design';

/** What the design applied last promised: its residual after, and the target level it was measured from. */
export interface EqPromise {
  after: { rmsDb: number; maxDb: number };
  levelOffsetDb: number;
}

interface EqDesignerApplyProps {
  answer: EqDesignAnswer;
  /** The run included the EQ the subs run now: a check, never applied (Apply replaces the subs' EQ). */
  check: boolean;
  /** The System changed since the run. */
  stale: boolean;
  readOnly: boolean;
  /** Each sub's name and how many EQ filters it runs now. */
  subs: readonly { name: string; eqCount: number }[];
  /** Set after Apply, until Undo or another design: what it promised. */
  applied: EqPromise | null;
  onApply: () => void;
  onUndo: () => void;
  /** Runs the model again with the EQ the subs now run (offered after Apply). */
  onCheck: (() => void) | null;
}

/** Apply to every sub output (or why not), Undo, the check after Apply, and the cautions about boosting. */
export function EqDesignerApply({ answer, check, stale, readOnly, subs, applied, onApply, onUndo, onCheck }: EqDesignerApplyProps) {
  const n = answer.filters.length;
  const these = n === 1 ? 'this filter' : `these ${n} filters`;
  const replaced = subs.filter((s) => s.eqCount > 0);
  const boosts = answer.filters.filter((f) => f.gainDb > 0);
  return (
    <section aria-label="Apply the EQ" className="flex flex-col gap-2">
      {check ? (
        <Notice kind="info" title="A check of the present EQ">
          <p>This run included the EQ the subs run now, so it is not applied (Apply replaces the subs’ EQ). Untick “Include the EQ the subs run now” to design.</p>
          {applied ? (
            <p className="mt-1" data-testid="eqd-promised">
              The design applied last promised {formatNumber(applied.after.rmsDb, 2)} dB RMS, {formatNumber(applied.after.maxDb, 2)} dB at most; with its EQ on, the subs now
              measure {formatNumber(answer.residual.before.rmsDb, 2)} dB RMS, {formatNumber(answer.residual.before.maxDb, 2)} dB at most, against the same target
              {Math.abs(answer.levelOffsetDb - applied.levelOffsetDb) > 0.005 ? ` (${formatSigned(answer.levelOffsetDb - applied.levelOffsetDb, 'dB', 2)} from the design’s level)` : ''}.
            </p>
          ) : null}
        </Notice>
      ) : applied ? (
        <Notice kind="ok" title="Applied to every sub output">
          <p>Each sub now runs {these}: its EQ list above and its sections below show them. Save to keep them.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button variant="secondary" onClick={onUndo} data-testid="eqd-undo">
              Undo
            </Button>
            {onCheck ? (
              <Button variant="secondary" onClick={onCheck} data-testid="eqd-check">
                Check: run again with this EQ
              </Button>
            ) : null}
          </div>
        </Notice>
      ) : n === 0 ? null : stale ? (
        <p className="text-sm text-warn">Design again before applying: this run no longer matches the System or the options.</p>
      ) : readOnly ? (
        <p className="text-sm text-ink-soft">Read only: a viewer cannot change the System.</p>
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={onApply} data-testid="eqd-apply">
            Apply to every sub
          </Button>
          <p className="text-sm text-ink-soft">
            Writes {these} as the EQ of {subs.length === 1 ? 'the sub' : subs.length === 2 ? 'both subs' : `all ${subs.length} subs`}
            {replaced.length ? `, replacing the EQ they run now (${replaced.map((s) => `${s.name}: ${s.eqCount} filter${s.eqCount === 1 ? '' : 's'}`).join(', ')})` : ''}.
          </p>
        </div>
      )}
      {boosts.length ? (
        <Notice kind="warn" title="A boost needs headroom">
          {boosts.map((f) => `${formatSigned(f.gainDb, 'dB')} at ${formatNumber(f.centerHz, 1)} Hz asks ${formatNumber(Math.pow(10, f.gainDb / 10), 1)}× the amplifier power`).join('; ')}, and more cone travel. Check the Headroom tab before you
          raise the level.
        </Notice>
      ) : null}
      <p className="text-xs text-ink-soft" data-testid="eqd-caution">
        {answer.caution} After a change, start playback low and raise it gradually.
      </p>
    </section>
  );
}
