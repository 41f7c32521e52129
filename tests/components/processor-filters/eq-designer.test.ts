import fc from 'fast-check';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { EqDesignerApply } from '@/components/processor-filters/eq-designer-apply';
import { defaultEqDesignerDraft, EQ_DESIGNER_FIELDS, readEqDesignerDraft, type EqDesignerDraft, type EqDesignerField } from '@/components/processor-filters/eq-designer-draft';
import { EqDesignerForm } from '@/components/processor-filters/eq-designer-form';
import { EqDesignerResult } from '@/components/processor-filters/eq-designer-result';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { computeEqDesign, eqDesignRequestFromDocument, type EqDesignAnswer } from '@/lib/system-model/eq-design';

// The EQ designer's form and read-outs (issue 16, parts 2 and 6). The defaults are the issue's own: 5 filters (at most
// 10) on 20–120 Hz, boosts up to +3 dB; the limits a field accepts are judged by the API's request schema
// (eqDesignRequestFromDocument parses with it), not by the form's own table. Systems are the invented demo's.

const draft = (patch: Partial<EqDesignerDraft> = {}): EqDesignerDraft => ({ ...defaultEqDesignerDraft(), ...patch });

function errorsOf(d: EqDesignerDraft, mark: '.' | ',' = '.') {
  const r = readEqDesignerDraft(d, mark);
  return r.ok ? {} : r.errors;
}

describe('readEqDesignerDraft: the form as typed, read into the designer’s options', () => {
  it('the defaults are issue 16’s: flat target at the MLP, 20–120 Hz, 5 filters, at most +3 dB boost, from the model', () => {
    const r = readEqDesignerDraft(draft(), '.');
    expect(r).toEqual({
      ok: true,
      options: { at: 'mlp', withPresentEq: false, target: { kind: 'flat' }, band: { startHz: 20, stopHz: 120 }, maxFilters: 5, maxBoostDb: 3, maxCutDb: 15, q: { min: 0.5, max: 10 } },
    });
  });

  it('reads either decimal mark and the field’s own unit after the number (lib/number-input)', () => {
    const r = readEqDesignerDraft(draft({ maxBoostDb: '2,5', stopHz: '100 Hz', target: 'house', riseDb: '4.5 dB', belowHz: '55' }), ',');
    expect(r.ok && r.options).toMatchObject({ maxBoostDb: 2.5, band: { startHz: 20, stopHz: 100 }, target: { kind: 'house', riseDb: 4.5, belowHz: 55 } });
  });

  it('names the field and the problem, and gives no options while any field is wrong', () => {
    expect(errorsOf(draft({ maxFilters: '12' }))).toEqual({ maxFilters: 'Filters, at most must be at most 10' });
    expect(errorsOf(draft({ maxFilters: '3.5' }))).toEqual({ maxFilters: 'Filters, at most must be a whole number' });
    expect(errorsOf(draft({ maxBoostDb: 'lots' })).maxBoostDb).toMatch(/^Largest boost: “lots” is not a number of dB/);
    expect(errorsOf(draft({ maxBoostDb: '' })).maxBoostDb).toBe('Largest boost: type a number');
    expect(errorsOf(draft({ startHz: '120', stopHz: '80' }))).toEqual({ stopHz: 'Band to must be above Band from (120 Hz)' });
    expect(errorsOf(draft({ qMin: '4', qMax: '2' }))).toEqual({ qMax: 'Q to must be at least Q from (4)' });
    expect(errorsOf(draft({ startHz: '10' })).startHz).toBe('Band from must be at least 15 Hz');
    // The house curve's fields count only when the target is a house curve.
    expect(readEqDesignerDraft(draft({ riseDb: '99' }), '.').ok).toBe(true);
    expect(errorsOf(draft({ target: 'house', riseDb: '99' }))).toEqual({ riseDb: 'Rise must be at most 15 dB' });
  });

  it('"include the present EQ" is a model option only', () => {
    const model = readEqDesignerDraft(draft({ withPresentEq: true }), '.');
    const files = readEqDesignerDraft(draft({ withPresentEq: true, source: 'measured' }), '.');
    expect(model.ok && model.options.withPresentEq).toBe(true);
    expect(files.ok && files.options.withPresentEq).toBe(false);
  });

  it('every value the form accepts, the API’s request schema accepts too; every value outside a field’s limits is refused by the form', () => {
    const doc = juniperLaneDocument();
    const value = (field: EqDesignerField) => {
      const s = EQ_DESIGNER_FIELDS[field];
      return s.integer ? fc.integer({ min: s.min, max: s.max }) : fc.double({ min: s.min, max: s.max, noNaN: true }).map((x) => Math.round(x * 100) / 100);
    };
    fc.assert(
      fc.property(value('startHz'), value('stopHz'), value('maxFilters'), value('maxBoostDb'), value('maxCutDb'), value('qMin'), value('qMax'), value('riseDb'), value('belowHz'), (a, b, n, boost, cut, q1, q2, rise, below) => {
        const d = draft({ target: 'house', startHz: String(a), stopHz: String(b), maxFilters: String(n), maxBoostDb: String(boost), maxCutDb: String(cut), qMin: String(q1), qMax: String(q2), riseDb: String(rise), belowHz: String(below) });
        const r = readEqDesignerDraft(d, '.');
        if (!(b > a) || q2 < q1) {
          expect(r.ok).toBe(false);
          return;
        }
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        const built = eqDesignRequestFromDocument(doc, r.options);
        // The one thing only the grid can refuse: a band too narrow to hold 3 of its points (48 per octave).
        if (!built.ok) expect(built.reason).toMatch(/at least 3 points/);
        else expect(built.request).toMatchObject({ band: { startHz: a, stopHz: b }, maxFilters: n, maxBoostDb: boost, maxCutDb: cut, q: { min: q1, max: q2 } });
      }),
      { numRuns: 200 },
    );
    fc.assert(
      fc.property(fc.constantFrom<EqDesignerField>('startHz', 'stopHz', 'maxFilters', 'maxBoostDb', 'maxCutDb', 'qMin', 'qMax'), fc.boolean(), fc.double({ min: 0.01, max: 1000, noNaN: true }), (field, above, by) => {
        const s = EQ_DESIGNER_FIELDS[field];
        const outside = above ? s.max + by : s.min - by;
        expect(errorsOf(draft({ [field]: String(outside) }))[field]).toMatch(above ? /at most/ : /at least|not a number/);
      }),
    );
  });
});

describe('the form shows what was typed, and the field and problem when it is wrong', () => {
  const form = (d: EqDesignerDraft, measuredUnavailable: string | null = null) =>
    renderToStaticMarkup(
      createElement(EqDesignerForm, { draft: d, onDraft: () => undefined, errors: errorsOf(d), source: d.source, measuredUnavailable, scope: 'system', onScope: () => undefined, mlpName: 'Row 1 centre', seatCount: 3 }),
    );

  it('keeps the wrong text in its field, marks it invalid and says why beside it', () => {
    const html = form(draft({ maxFilters: '12' }));
    expect(html).toMatch(/value="12"[^>]*aria-invalid="true"|aria-invalid="true"[^>]*value="12"/);
    expect(html).toMatch(/role="alert"[^>]*>Filters, at most must be at most 10</);
    expect(form(draft())).not.toContain('aria-invalid');
  });

  it('carries the boost caution; offers the seats’ average and the MLP by name; says why measurements cannot be used', () => {
    const html = form(draft(), 'Sign in and save this System to design from its stored measurements.');
    expect(html).toContain('Boosting the sub’s low end costs amplifier and driver headroom');
    expect(html).toContain('Check the Headroom tab after EQ');
    expect(html).toContain('The main listening position (Row 1 centre)');
    expect(html).toContain('The seats’ average (3 seats)');
    expect(html).toMatch(/data-testid="eqd-source-measured"[^>]*disabled|disabled=""[^>]*data-testid="eqd-source-measured"/);
    expect(html).toContain('Sign in and save this System');
    expect(html).not.toContain('eqd-rise'); // no house-curve fields for a flat target
    expect(form(draft({ target: 'house' }))).toContain('data-testid="eqd-riseDb"');
  });
});

describe('the result and Apply', () => {
  const doc = juniperLaneDocument();
  const designed = (() => {
    const r = eqDesignRequestFromDocument(doc, { at: 'average' });
    if (!r.ok) throw new Error(r.reason);
    return computeEqDesign(r.request);
  })();
  const result = (a: EqDesignAnswer, check = false) => renderToStaticMarkup(createElement(EqDesignerResult, { answer: a, check, elapsedMs: 14 }));
  const apply = (a: EqDesignAnswer, p: { check?: boolean; stale?: boolean; readOnly?: boolean; applied?: boolean } = {}) =>
    renderToStaticMarkup(
      createElement(EqDesignerApply, {
        answer: a,
        check: p.check ?? false,
        stale: p.stale ?? false,
        readOnly: p.readOnly ?? false,
        subs: [{ name: 'Sub front left', eqCount: 2 }, { name: 'Sub right wall', eqCount: 0 }],
        applied: p.applied ? { after: a.residual.after, levelOffsetDb: a.levelOffsetDb } : null,
        onApply: () => undefined,
        onUndo: () => undefined,
        onCheck: () => undefined,
      }),
    );

  it('states the input used, the residual before and after in dB, and every filter’s centre, gain and Q', () => {
    expect(designed.filters.length).toBeGreaterThan(0);
    const html = result(designed);
    expect(html).toContain('model, power average of 3 seats');
    const number = (x: number, d: number) => x.toFixed(d).replace('-', '−');
    expect(html).toContain(`${number(designed.residual.before.rmsDb, 2)} dB RMS, ${number(designed.residual.before.maxDb, 2)} dB at most`);
    expect(html).toContain(`${number(designed.residual.after.rmsDb, 2)} dB RMS, ${number(designed.residual.after.maxDb, 2)} dB at most`);
    designed.filters.forEach((f, i) => {
      const row = new RegExp(`data-testid="eqd-filter-${i + 1}".*?</tr>`).exec(html)?.[0] ?? '';
      expect(row).toContain(number(f.centerHz, 1));
      expect(row).toContain(`${f.gainDb > 0 ? '+' : ''}${number(f.gainDb, 1)}`);
      expect(row).toContain(number(f.q, 2));
    });
  });

  it('lists each null left alone with its reason; says so when there is none', () => {
    const withNull: EqDesignAnswer = { ...designed, nulls: [{ frequencyHz: 106.9, depthDb: 8.3, lowHz: 106.1, highHz: 108.5, reason: 'a cancellation at this seat (invented for the test)' }] };
    expect(result(withNull)).toMatch(/106\.9 Hz \(106\.1–108\.5 Hz\), 8\.3 dB deep<\/span>: a cancellation at this seat/);
    expect(result({ ...designed, nulls: [] })).toContain('nothing had to be left alone');
  });

  it('offers Apply only for a fresh design that is not a check, and never to a viewer; says which EQ it replaces', () => {
    const html = apply(designed);
    expect(html).toContain('data-testid="eqd-apply"');
    expect(html).toContain('replacing the EQ they run now (Sub front left: 2 filters)');
    for (const p of [{ check: true }, { stale: true }, { readOnly: true }, { applied: true }]) expect(apply(designed, p)).not.toContain('data-testid="eqd-apply"');
    expect(apply(designed, { applied: true })).toContain('data-testid="eqd-undo"');
    expect(apply({ ...designed, filters: [] })).not.toContain('data-testid="eqd-apply"');
  });

  it('carries the headroom caution beside Apply, and names each boost with the amplifier power it asks (+3 dB ≈ 2×, 10^(3/10))', () => {
    const boosted: EqDesignAnswer = { ...designed, filters: [{ kind: 'peaking', centerHz: 32, gainDb: 3, q: 0.5 }] };
    const html = apply(boosted);
    expect(html).toContain('check the Headroom tab after EQ');
    expect(html).toContain('+3.0\u2009dB at 32.0 Hz asks 2.0× the amplifier power');
    expect(apply({ ...designed, filters: [{ kind: 'peaking', centerHz: 50, gainDb: -6, q: 4 }] })).not.toContain('A boost needs headroom');
  });
});
