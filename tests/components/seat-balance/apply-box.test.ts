import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { ApplyBox } from '@/components/seat-balance/apply-box';
import type { SettingsRow } from '@/components/seat-balance/settings-table';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';

// Issue 15: Apply is offered only when the recommendation's mean spread is at least 0.1 dB below the present one;
// otherwise the panel says the present settings are as good as it gets within the limits. A gain boost carries a
// caution (common practice: more level needs amplifier and driver headroom).

const summary = (meanSpreadDb: number) => ({ meanSpreadDb, maxSpreadDb: 20, maxSpreadHz: 40, meanLevelDb: -1 });
const answer = (presentDb: number, afterDb: number) => ({ present: summary(presentDb), before: summary(9), after: summary(afterDb), limits: { maxDelayMs: 20, minGainDb: -12, maxGainDb: 6, allowInvert: true, maxOutputLossDb: 3 } }) as unknown as SeatBalanceAnswer;
const row = (name: string, presentGainDb: number, recommendedGainDb: number): SettingsRow => ({
  name,
  present: { delayMs: 0, gainDb: presentGainDb, invert: false },
  recommended: { delayMs: 3, gainDb: recommendedGainDb, invert: false },
  searched: { delayMs: 3, gainDb: recommendedGainDb, invert: false },
});
const noop = () => undefined;
const render = (a: SeatBalanceAnswer, options: { rows?: SettingsRow[]; stale?: boolean; readOnly?: boolean; applied?: boolean } = {}) =>
  renderToStaticMarkup(createElement(ApplyBox, { answer: a, rows: options.rows ?? [row('Sub A (invented)', 0, -2)], stale: options.stale ?? false, readOnly: options.readOnly ?? false, applied: options.applied ?? false, onApply: noop, onUndo: noop }));

describe('ApplyBox: Apply only when it is worth 0.1 dB', () => {
  it('offers Apply at 0.1 dB better and more (0.30 → 0.20 dB, 8.74 → 3.88 dB), with no float slip at the edge', () => {
    expect(render(answer(0.3, 0.2))).toContain('data-testid="sb-apply"');
    expect(render(answer(8.74, 3.88))).toContain('data-testid="sb-apply"');
  });

  it('does not offer Apply at less than 0.1 dB better, and says why', () => {
    const html = render(answer(5, 4.91));
    expect(html).not.toContain('data-testid="sb-apply"');
    expect(html).toContain('The present settings are as good as it gets within these limits');
    expect(html).toContain('4.91 dB mean spread');
  });

  it('no Apply on a System changed since the run, nor for a viewer; after Apply, Undo', () => {
    expect(render(answer(8, 4), { stale: true })).not.toContain('data-testid="sb-apply"');
    expect(render(answer(8, 4), { stale: true })).toContain('run Seat balance again');
    expect(render(answer(8, 4), { readOnly: true })).not.toContain('data-testid="sb-apply"');
    const applied = render(answer(8, 4), { applied: true });
    expect(applied).toContain('data-testid="sb-undo"');
    expect(applied).not.toContain('data-testid="sb-apply"');
  });

  it('cautions about headroom for a sub whose gain goes up above 0 dB, naming it; not for a cut', () => {
    const boosted = render(answer(8, 4), { rows: [row('Sub A (invented)', 0, 2.5), row('Sub B (invented)', 0, -3)] });
    expect(boosted).toContain('A gain boost needs headroom');
    expect(boosted).toContain('Sub A (invented) +2.5');
    expect(boosted).not.toContain('Sub B (invented) −3');
    expect(render(answer(8, 4), { rows: [row('Sub B (invented)', 0, -3)] })).not.toContain('A gain boost needs headroom');
  });
});
