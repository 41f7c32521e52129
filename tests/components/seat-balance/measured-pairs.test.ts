import { describe, expect, it } from 'vitest';
import { measurementsInScope, pairStatusGrid } from '@/components/seat-balance/measured-pairs';
import { seatBalanceMeasuredRequestFromDocument } from '@/lib/system-model/seat-balance-document';
import { juniperLaneDocument } from '@/lib/demo/systems';

// Seat balance from measurements (issue 15): which stored files the panel hands to the request builder, and the
// sub × seat table it shows when some are missing. Expected values are written out by hand (from the brief's rules).

const SYSTEM = '00000000-0000-4000-8000-000000000001';
const OTHER = '00000000-0000-4000-8000-000000000002';
const file = (id: string, systemId: string | null, role: string, seat: string, hasPhase = true) => ({ id, name: `${role} at ${seat} (invented)`, systemId, role, seat, hasPhase });

describe('measurementsInScope', () => {
  const items = [file('a', OTHER, 'Sub A', 'Seat 1'), file('b', SYSTEM, 'Sub A', 'Seat 1'), file('c', null, 'Sub A', 'Seat 2'), file('d', SYSTEM, 'Sub A', 'Seat 2')];

  it("'system' keeps only the files uploaded for this System, in the listed (newest first) order", () => {
    expect(measurementsInScope(items, SYSTEM, 'system').map((m) => m.id)).toEqual(['b', 'd']);
  });

  it("'workspace' keeps every file, this System's first, each part in the listed order", () => {
    expect(measurementsInScope(items, SYSTEM, 'workspace').map((m) => m.id)).toEqual(['b', 'd', 'a', 'c']);
  });

  it("so the builder picks this System's file over a newer one of another System with the same names", () => {
    const doc = juniperLaneDocument();
    const [sub1, sub2] = doc.subs.map((s) => s.name) as [string, string];
    const list = doc.seats.flatMap((seat) => [
      file(`other-${seat.id}`, OTHER, sub1, seat.name),
      file(`own-${seat.id}-1`, SYSTEM, sub1, seat.name),
      file(`own-${seat.id}-2`, SYSTEM, sub2, seat.name),
    ]);
    const r = seatBalanceMeasuredRequestFromDocument(doc, measurementsInScope(list, SYSTEM, 'workspace'));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.body.measurements.filter((m) => m.sub === sub1).map((m) => m.measurementId)).toEqual(doc.seats.map((s) => `own-${s.id}-1`));
  });
});

describe('pairStatusGrid', () => {
  it('marks each sub × seat as found, missing, or only without phase (with the file named)', () => {
    const grid = pairStatusGrid(['Sub A', 'Sub B'], ['Seat 1', 'Seat 2'], [{ sub: 'Sub B', seat: 'Seat 1' }], [{ sub: 'Sub A', seat: 'Seat 2', name: 'A2 no phase (invented)' }]);
    expect(grid).toEqual([
      { sub: 'Sub A', cells: [{ seat: 'Seat 1', status: { kind: 'ok' } }, { seat: 'Seat 2', status: { kind: 'no-phase', file: 'A2 no phase (invented)' } }] },
      { sub: 'Sub B', cells: [{ seat: 'Seat 1', status: { kind: 'missing' } }, { seat: 'Seat 2', status: { kind: 'ok' } }] },
    ]);
  });

  it("matches the builder's own missing / withoutPhase lists on the demo System with one file gone and one without phase", () => {
    const doc = juniperLaneDocument();
    const subs = doc.subs.map((s) => s.name);
    const seats = doc.seats.map((s) => s.name);
    const list = subs.flatMap((sub, i) => seats.map((seat, k) => file(`${i}-${k}`, SYSTEM, sub, seat, !(i === 1 && k === 2)))).filter((m) => m.id !== '0-0');
    const r = seatBalanceMeasuredRequestFromDocument(doc, list);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const cells = pairStatusGrid(subs, seats, r.missing, r.withoutPhase).flatMap((row) => row.cells.map((c) => c.status.kind));
    expect(cells).toEqual(['missing', ...Array(seats.length - 1).fill('ok'), 'ok', 'ok', 'no-phase', ...Array(seats.length - 3).fill('ok')]);
  });
});
