/**
 * Seat balance on a System, proven by applying it ("advice is proven by applying it", DEVELOPERS.md): the answer is
 * written into the document as the editor's Apply button does, and the Modes tab's own figure — room-response's mean
 * spread of the applied document (roomResponseRequestFromDocument → computeRoomResponse) — is the judge.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { computeRoomResponse, roomResponseRequestFromDocument } from '@/lib/system-model/room-response';
import { logFrequencyGridHz, modalTransfers } from '@/dsp';
import { computeMeasuredSeatBalance, computeSeatBalance } from '@/lib/system-model/seat-balance';
import { applySeatBalanceToDocument, seatBalanceMeasuredRequestFromDocument, seatBalanceRequestFromDocument, seatBalanceStateFromDocument } from '@/lib/system-model/seat-balance-document';
import { roomResponseRequestSchema } from '@/lib/validations/compute-room';
import { seatBalanceMeasuredRequestSchema } from '@/lib/validations/compute-seat-balance';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';

/** The Modes tab's mean seat-to-seat spread of a document (20–120 Hz on 15–200 Hz at 48 points per octave). */
const modesSpreadDb = (doc: SystemDocument) => computeRoomResponse(roomResponseRequestSchema.parse(roomResponseRequestFromDocument(doc))).spread!.meanSpreadDb;
/** Both figures are rounded to 0.01 dB. */
const ROUNDED = 0.0101;

const hundredths = (lo: number, hi: number) => fc.integer({ min: Math.round(lo * 100), max: Math.round(hi * 100) }).map((v) => v / 100);
const tenths = (lo: number, hi: number) => fc.integer({ min: Math.round(lo * 10), max: Math.round(hi * 10) }).map((v) => v / 10);

/** The demo System (invented) with its subs and seats moved, their settings and box counts changed, and 2–4 seats. */
const documentArb: fc.Arbitrary<SystemDocument> = fc
  .record({
    subs: fc.array(fc.record({ xM: hundredths(0.1, 4.8), yM: hundredths(0.1, 6.3), delayMs: hundredths(0, 12), gainDb: tenths(-6, 3), invert: fc.boolean(), count: fc.integer({ min: 1, max: 2 }) }), { minLength: 2, maxLength: 3 }),
    seats: fc.array(fc.record({ xM: hundredths(0.6, 4.3), yM: hundredths(2.5, 5.8), zM: hundredths(0.9, 1.3) }), { minLength: 2, maxLength: 4 }),
  })
  .map(({ subs, seats }) => {
    const demo = juniperLaneDocument();
    const template = demo.subs[0]!;
    return systemDocumentSchema.parse({
      ...demo,
      subs: subs.map((s, i) => ({ ...template, id: `sub${i + 1}`, name: `Sub ${i + 1}`, zM: 0.3, ...s })),
      seats: seats.map((p, i) => ({ id: i === 0 ? 'mlp' : `seat${i + 1}`, name: `Seat ${i + 1}`, ...p })),
      mlpSeatId: 'mlp',
    });
  });

const mean = (v: number[]) => v.reduce((a, x) => a + x, 0) / v.length;

describe('applySeatBalanceToDocument: the advice proven by applying it', () => {
  it('the Modes tab’s mean spread of the applied System equals answer.after and is never above the present one; mean delay and level kept', () => {
    let improved = 0;
    fc.assert(
      fc.property(documentArb, (doc) => {
        const r = seatBalanceRequestFromDocument(doc);
        if (!r.ok) throw new Error(r.reason);
        const answer = computeSeatBalance(r.request, r.extras);
        const applied = applySeatBalanceToDocument(doc, answer);
        systemDocumentSchema.parse(applied);
        const presentDb = modesSpreadDb(doc);
        const appliedDb = modesSpreadDb(applied);
        const what = `present ${presentDb} dB, applied ${appliedDb} dB, answer ${JSON.stringify({ after: answer.after, present: answer.present, subs: answer.subs })}`;
        expect(Math.abs(appliedDb - answer.after.meanSpreadDb), what).toBeLessThanOrEqual(ROUNDED);
        expect(Math.abs(presentDb - answer.present!.meanSpreadDb), what).toBeLessThanOrEqual(ROUNDED);
        expect(appliedDb, what).toBeLessThanOrEqual(presentDb);
        if (appliedDb < presentDb - 0.5) improved++;
        // The group keeps its mean delay where it can: shifting every delay by the same amount keeps them ≥ 0 and ≤ 100 ms …
        const shiftMs = mean(doc.subs.map((s) => s.delayMs)) - mean(answer.subs.map((s) => s.delayMs));
        if (shiftMs >= 0 && shiftMs <= 100 - Math.max(...answer.subs.map((s) => s.delayMs))) {
          expect(Math.abs(mean(applied.subs.map((s) => s.delayMs)) - mean(doc.subs.map((s) => s.delayMs))), what).toBeLessThanOrEqual(0.0051);
        }
        // … and its level at the seats (each gain is written to 0.1 dB: within 0.05 dB).
        const before = seatBalanceStateFromDocument(doc)!;
        const after = seatBalanceStateFromDocument(applied)!;
        expect(Math.abs(after.present.meanLevelDb - before.present.meanLevelDb), what).toBeLessThanOrEqual(0.06);
        // Polarity: at least half the subs keep theirs (inverting every sub together changes no seat's level).
        expect(applied.subs.filter((s, i) => s.invert === doc.subs[i]!.invert).length * 2, what).toBeGreaterThanOrEqual(doc.subs.length);
        // Only the subs' delay, gain and polarity change.
        const withoutSettings = (d: SystemDocument) => ({ ...d, subs: d.subs.map((s) => ({ ...s, delayMs: 0, gainDb: 0, invert: false })) });
        expect(withoutSettings(applied)).toEqual(withoutSettings(doc));
      }),
      { numRuns: 8, seed: 1515, endOnFailure: true },
    );
    expect(improved, 'Systems improved by more than 0.5 dB').toBeGreaterThan(0);
  }, 120_000);

  it('the demo System: applied, the Modes tab shows the answer’s spread, below the present one', () => {
    const doc = juniperLaneDocument();
    const r = seatBalanceRequestFromDocument(doc);
    if (!r.ok) throw new Error(r.reason);
    const answer = computeSeatBalance(r.request, r.extras);
    const applied = applySeatBalanceToDocument(doc, answer);
    console.log(`demo: Modes tab ${modesSpreadDb(doc)} dB → ${modesSpreadDb(applied)} dB (answer ${answer.present!.meanSpreadDb} → ${answer.after.meanSpreadDb} dB)`);
    expect(Math.abs(modesSpreadDb(applied) - answer.after.meanSpreadDb)).toBeLessThanOrEqual(ROUNDED);
    expect(modesSpreadDb(applied)).toBeLessThan(modesSpreadDb(doc));
  }, 60_000);

  it('an answer for another number of subs changes nothing', () => {
    const doc = juniperLaneDocument();
    expect(applySeatBalanceToDocument(doc, { subs: [{ name: 'Sub', delayMs: 1, gainDb: 0, invert: false }], after: { meanSpreadDb: 0, maxSpreadDb: 0, maxSpreadHz: 20, meanLevelDb: 0 } })).toBe(doc);
  });
});

describe('applySeatBalanceToDocument from measurements (files taken without processing: the answer is the whole delay)', () => {
  it('the Modes tab of the applied System equals answer.after, and answer.present is the Modes tab of the System as it is', () => {
    fc.assert(
      fc.property(documentArb, (doc) => {
        // Invented files: each sub (all its boxes) alone at each seat, no processing, on the Modes tab's grid, with phase.
        const grid = { startHz: 15, stopHz: 200, pointsPerOctave: 48 };
        const f = logFrequencyGridHz(grid);
        const t = modalTransfers({ room: doc.room, sourcesM: doc.subs.map((s) => ({ x: s.xM, y: s.yM, z: s.zM })), receiversM: doc.seats.map((s) => ({ x: s.xM, y: s.yM, z: s.zM })), frequencyHz: f, rt60S: doc.room.rt60S, temperatureC: doc.room.temperatureC, maxModeHz: 300 });
        const files = doc.subs.flatMap((sub, s) =>
          doc.seats.map((seat, k) => {
            const c = t.transfers[s]![k]!;
            const curve = { frequencyHz: Array.from(f), magnitudeDb: Array.from(c.magnitudeDb, (db) => db + 20 * Math.log10(sub.count)), phaseDeg: Array.from(c.re, (re, i) => (Math.atan2(c.im[i]!, re) * 180) / Math.PI) };
            return { ref: { id: `00000000-0000-4000-8000-${String(s * 100 + k + 1).padStart(12, '0')}`, name: `File ${s}-${k} (invented)`, role: sub.name, seat: seat.name, hasPhase: true }, curve };
          }),
        );
        const r = seatBalanceMeasuredRequestFromDocument(doc, files.map((x) => x.ref));
        if (!r.ok) throw new Error(r.reason);
        const body = seatBalanceMeasuredRequestSchema.parse(r.body);
        const answer = computeMeasuredSeatBalance(body, body.measurements.map((m) => files.find((x) => x.ref.id === m.measurementId)!.curve));
        const applied = applySeatBalanceToDocument(doc, answer, { delaysIncludeAlignment: true });
        systemDocumentSchema.parse(applied);
        const what = JSON.stringify({ after: answer.after, present: answer.present, subs: answer.subs });
        expect(Math.abs(modesSpreadDb(doc) - answer.present!.meanSpreadDb), what).toBeLessThanOrEqual(ROUNDED);
        expect(Math.abs(modesSpreadDb(applied) - answer.after.meanSpreadDb), what).toBeLessThanOrEqual(ROUNDED);
        expect(modesSpreadDb(applied), what).toBeLessThanOrEqual(modesSpreadDb(doc));
      }),
      { numRuns: 4, seed: 1516, endOnFailure: true },
    );
  }, 120_000);
});

describe('seatBalanceRequestFromDocument and seatBalanceStateFromDocument', () => {
  it('refuses a System without a sub, with one seat, with more than 16 seats, or with a seat or sub outside the room, saying why', () => {
    const doc = juniperLaneDocument();
    const seat = doc.seats[0]!;
    const cases: [string, SystemDocument, RegExp][] = [
      ['no sub', { ...doc, subs: [] }, /sub/i],
      ['one seat', { ...doc, seats: [seat] }, /second seat/i],
      ['17 seats', { ...doc, seats: Array.from({ length: 17 }, (_, i) => ({ ...seat, id: `s${i}`, name: `Seat ${i}` })) }, /16 seats/],
      ['a seat outside', { ...doc, seats: [seat, { ...doc.seats[1]!, yM: 7 }] }, /outside the room/],
      ['a sub outside', { ...doc, subs: [doc.subs[0]!, { ...doc.subs[1]!, xM: 5.5 }] }, /outside the room/],
    ];
    for (const [label, bad, reason] of cases) {
      const r = seatBalanceRequestFromDocument(bad);
      expect(r.ok, label).toBe(false);
      if (!r.ok) expect(r.reason, label).toMatch(reason);
      expect(seatBalanceStateFromDocument(bad), label).toBeNull();
    }
  });

  it('the request: every seat and sub, the Modes tab’s grid and band, the present settings and 20·log10(count) per sub', () => {
    const doc = { ...juniperLaneDocument(), subs: juniperLaneDocument().subs.map((s, i) => ({ ...s, delayMs: [0, 1.5][i]!, gainDb: [0, -1][i]!, invert: i === 1, count: i + 1 })) };
    const r = seatBalanceRequestFromDocument(doc, { placementCount: 2, seed: 7 });
    if (!r.ok) throw new Error(r.reason);
    expect(r.request.grid).toEqual({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
    expect(r.request.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(r.request.seats.map((s) => s.name)).toEqual(doc.seats.map((s) => s.name));
    expect(r.request.subs.map((s) => [s.xM, s.yM, s.zM])).toEqual(doc.subs.map((s) => [s.xM, s.yM, s.zM]));
    expect(r.request.placement?.count).toBe(2);
    expect(r.request.seed).toBe(7);
    expect(r.extras.present).toEqual([{ delayMs: 0, gainDb: 0, invert: false }, { delayMs: 1.5, gainDb: -1, invert: true }]);
    expect(r.extras.fixedGainDb[1]).toBeCloseTo(20 * Math.log10(2), 12);
  });

  it('seatBalanceStateFromDocument matches the answer’s before and present, and the Modes tab', () => {
    const doc = { ...juniperLaneDocument(), subs: juniperLaneDocument().subs.map((s, i) => ({ ...s, delayMs: [0, 2.2][i]!, gainDb: [0, -2][i]! })) };
    const state = seatBalanceStateFromDocument(doc)!;
    const r = seatBalanceRequestFromDocument(doc);
    if (!r.ok) throw new Error(r.reason);
    const answer = computeSeatBalance(r.request, r.extras);
    expect(state.before).toEqual(answer.before);
    expect(state.present).toEqual(answer.present);
    expect(state.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(Math.abs(state.present.meanSpreadDb - modesSpreadDb(doc))).toBeLessThanOrEqual(ROUNDED);
  }, 60_000);
});

describe('seatBalanceMeasuredRequestFromDocument', () => {
  const doc = juniperLaneDocument();
  const file = (id: string, role: string, seat: string, hasPhase = true) => ({ id, name: `File ${id} (invented)`, role, seat, hasPhase });
  const all = doc.subs.flatMap((sub) => doc.seats.map((seat) => file(`${sub.id}-${seat.id}`, sub.name, seat.name)));

  it('picks the first file with phase per sub per seat, case and outer spaces aside', () => {
    const list = [file('newer-no-phase', ' sub FRONT left ', 'row 1 LEFT', false), ...all];
    const r = seatBalanceMeasuredRequestFromDocument(doc, list);
    if (!r.ok) throw new Error(r.reason);
    expect(r.body.measurements).toHaveLength(doc.subs.length * doc.seats.length);
    expect(r.body.measurements[0]).toEqual({ sub: 'Sub front left', seat: 'Row 1 left', measurementId: 'sub1-left' });
    expect(r.body.grid).toEqual({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
  });

  it('says which pairs are missing and which have only files without phase', () => {
    const list = all.filter((f) => f.id !== 'sub2-right').map((f) => (f.id === 'sub1-mlp' ? { ...f, hasPhase: false } : f));
    const r = seatBalanceMeasuredRequestFromDocument(doc, list);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.missing).toEqual([{ sub: 'Sub right wall', seat: 'Row 1 right' }]);
    expect(r.withoutPhase.map((w) => w.seat)).toEqual(['Row 1 centre (MLP)']);
    expect(r.reason).toMatch(/1 sub-and-seat pair has no measurement; 1 only without phase/);
  });
});
