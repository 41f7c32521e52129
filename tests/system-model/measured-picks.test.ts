import { describe, expect, it } from 'vitest';
import { measuredSeats, type PickableMeasurement } from '@/lib/system-model/measured-picks';
import { settingsForDocument } from '@/lib/system-model/measured-sources';
import { systemModelFromDocument } from '@/lib/system-model/system-from-document';
import { testSystem } from './test-system';

// Which stored measurements a decision runs on at each seat (rules stated in lib/system-model/measured-picks.ts); the
// test System's subs are "Sub A" and "Sub B", its main channels L, C, R. Names and seats invented.
let n = 0;
const m = (seat: string | null, role: string | null, extra: Partial<PickableMeasurement> = {}): PickableMeasurement => ({ id: `id-${++n}`, name: `${seat} ${role}`, seat, role, runLabel: null, hasPhase: true, ...extra });

describe('measuredSeats', () => {
  it('each sub alone when every sub has a file at the seat; the channel’s own file before "mains"; one with phase first', () => {
    const doc = testSystem();
    const items = [m('Row 1', 'mains', { hasPhase: false }), m('Row 1', 'mains'), m('Row 1', 'L', { runLabel: 'treble +2' }), m('Row 1', 'Sub A'), m('Row 1', 'sub b'), m('Row 1', 'sub')];
    const { seats, gaps } = measuredSeats(doc, items, 'L');
    expect(gaps).toEqual([]);
    expect(seats).toHaveLength(1);
    expect(seats[0]!.mains.role).toBe('L');
    expect(seats[0]!.subs).toMatchObject({ kind: 'each', items: [{ role: 'Sub A' }, { role: 'sub b' }] });
    expect(seats[0]!.picks.subs).toEqual({ kind: 'each', curves: [{ measurementId: items[3]!.id }, { measurementId: items[4]!.id }] });
    expect(seats[0]!.files).toBe('Row 1 L (treble +2); Row 1 Sub A; Row 1 sub b');
    // For C there is only the "mains" file: the one with phase wins.
    expect(measuredSeats(doc, items, 'C').seats[0]!.mains.id).toBe(items[1]!.id);
  });

  it('every sub together when one sub lacks its own file; seats without the mains or the subs are named with what is missing', () => {
    const doc = testSystem();
    const items = [m('Row 1', 'mains'), m('Row 1', 'Sub A'), m('Row 1', 'sub'), m('Row 2', 'Sub A'), m('Row 2', 'Sub B'), m('Row 3', 'mains'), m(null, 'mains')];
    const { seats, gaps } = measuredSeats(doc, items, 'L');
    expect(seats.map((s) => [s.seat, s.subs.kind])).toEqual([['Row 1', 'all']]);
    expect(gaps).toEqual(['Row 2: no measurement of L alone', 'Row 3: no measurement of the subs']);
  });
});

describe('settingsForDocument', () => {
  it('each sub measured alone: the row’s settings as they are; every sub together: the one source’s shift and flip on every sub (by hand)', () => {
    const doc = testSystem();
    const model = systemModelFromDocument(doc)!;
    const each = settingsForDocument(doc, undefined, { mains: { measurementId: 'a' }, subs: { kind: 'each', curves: [] } }, { mainsDelayMs: 0, subs: [] }, { mainsDelayMs: 1, subs: [{ name: 'Sub A', delayMs: 2, invert: true }] });
    expect(each).toEqual({ mainsDelayMs: 1, subs: [{ name: 'Sub A', delayMs: 2, invert: true }] });
    const all = settingsForDocument(doc, undefined, { mains: { measurementId: 'a' }, subs: { kind: 'all', curve: { measurementId: 'b' } } }, { mainsDelayMs: 0, subs: [{ delayMs: 1, invert: false }] }, { mainsDelayMs: 0, subs: [{ name: 'All subs', delayMs: 2.5, invert: true }] });
    expect(all.subs.map((s) => s.name)).toEqual(doc.subs.map((s) => s.name));
    all.subs.forEach((s, k) => {
      expect(s.delayMs).toBeCloseTo(model.subs[k]!.delayMs + 1.5, 9);
      expect(s.invert).toBe(!model.subs[k]!.invert);
    });
    expect(all.mainsDelayMs).toBeCloseTo(model.mains.delayMs, 9);
  });
});
