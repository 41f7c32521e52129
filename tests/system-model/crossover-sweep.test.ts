import { describe, expect, it } from 'vitest';
import { applyCrossoverSweepToDocument, candidateRangeHz, computeCrossoverSweep, crossoverSweepRequestFromDocument, withProfiles } from '@/lib/system-model/crossover-sweep';
import { timingRequestFromDocument } from '@/lib/system-model/timing';
import { crossoverSweepRequestSchema } from '@/lib/validations/compute-blend';
import type { SpeakerProfile, SystemDocument } from '@/lib/validations/system';
import { TEST_MAIN, TEST_SUB, testSystem } from './test-system';

const LR4 = { family: 'linkwitz-riley' as const, order: 4 };
const BW2 = { family: 'butterworth' as const, order: 2 };
const OTHER_SUB: SpeakerProfile = { ...TEST_SUB, id: 'other-sub', name: 'Other sub (invented)', highRolloff: { kind: 'lowpass', cornerHz: 140, q: 0.7 } };
const OTHER_MAIN: SpeakerProfile = { ...TEST_MAIN, id: 'other-main', name: 'Other main (invented)', lowRolloff: { kind: 'vented', cornerHz: 40 } };

describe('candidateRangeHz: the candidates a person picks', () => {
  it('40 … 60 Hz in 5 Hz steps; 0.3 Hz steps to 0.01 Hz; nothing for a bad step or range; at most 200', () => {
    expect(candidateRangeHz(40, 60, 5)).toEqual([40, 45, 50, 55, 60]);
    expect(candidateRangeHz(40, 41, 0.3)).toEqual([40, 40.3, 40.6, 40.9]);
    expect(candidateRangeHz(40, 60, 0)).toEqual([]);
    expect(candidateRangeHz(60, 40, 5)).toEqual([]);
    expect(candidateRangeHz(20, 300, 0.1)).toHaveLength(200);
  });
});

describe('withProfiles: another profile tried in', () => {
  it('another sub profile: copied in once, every sub uses it; the document passed in is untouched', () => {
    const doc = testSystem();
    const next = withProfiles(doc, { subProfile: OTHER_SUB });
    expect(next.profiles.map((p) => p.id)).toEqual(['test-main', 'test-sub', 'other-sub']);
    expect(next.subs.map((s) => s.profileId)).toEqual(['other-sub', 'other-sub']);
    expect(withProfiles(next, { subProfile: OTHER_SUB }).profiles).toHaveLength(3);
    expect(doc).toEqual(testSystem());
  });

  it('another main profile: every speaker that shared the shown channel’s profile', () => {
    const base = testSystem();
    const doc: SystemDocument = { ...base, profiles: [...base.profiles, { ...TEST_MAIN, id: 'centre-main' }], speakers: base.speakers.map((s) => (s.channel === 'C' ? { ...s, profileId: 'centre-main' } : s)) };
    expect(withProfiles(doc, { mainsProfile: OTHER_MAIN }).speakers.map((s) => s.profileId)).toEqual(['other-main', 'centre-main', 'other-main']);
  });
});

describe('crossoverSweepRequestFromDocument: the sweep request for the System', () => {
  it('the whole system as Timing sends it, with the pairings and candidates chosen and a 20 ms search', () => {
    const doc = testSystem();
    const req = crossoverSweepRequestFromDocument(doc, { pairings: [{ mainsFilter: LR4, subFilter: LR4 }], candidatesHz: [60, 80, 100] })!;
    const { stepMs: _step, ...system } = timingRequestFromDocument(doc)!;
    void _step;
    expect(req).toEqual({ ...system, pairings: [{ mainsFilter: LR4, subFilter: LR4 }], candidatesHz: [60, 80, 100], maxDelayMs: 20 });
    expect(crossoverSweepRequestSchema.safeParse(req).success).toBe(true);
  });

  it('a sub profile tried in shows in the request (its upper roll-off); no subs → null', () => {
    const req = crossoverSweepRequestFromDocument(testSystem(), { subProfile: OTHER_SUB, pairings: [{ mainsFilter: BW2, subFilter: LR4 }], candidatesHz: [80] })!;
    expect(req.subs[0]!.rolloff).toEqual([TEST_SUB.lowRolloff, OTHER_SUB.highRolloff]);
    expect(crossoverSweepRequestFromDocument({ ...testSystem(), subs: [] }, { pairings: [{ mainsFilter: BW2, subFilter: LR4 }], candidatesHz: [80] })).toBeNull();
  });
});

describe('applyCrossoverSweepToDocument: a row written back', () => {
  const row = (crossoverHz: number, subs: { delayMs: number; invert: boolean }[]) => ({ crossoverHz, mainsFilter: LR4, subFilter: LR4, set: { mainsDelayMs: 5.83, subs: subs.map((s, k) => ({ name: `s${k}`, ...s })) } });

  it('crossover, both slopes, each sub’s delay and polarity; nothing else', () => {
    // Present: mains 5.83, Sub A 2.91, Sub B 0 ms. The row moves Sub A 1 ms later and flips it.
    const out = applyCrossoverSweepToDocument(testSystem(), row(95, [{ delayMs: 3.91, invert: true }, { delayMs: 0, invert: false }]));
    expect(out.bassManagement).toEqual({ ...testSystem().bassManagement, crossoverHz: 95, mainsHighpass: LR4, subLowpass: LR4 });
    expect(out.subs.map((s) => [s.delayMs, s.invert])).toEqual([[1, true], [0, false]]);
    const base = testSystem();
    expect({ ...out, bassManagement: base.bassManagement, subs: out.subs.map((s) => ({ ...s, delayMs: 0, invert: false })) }).toEqual(base);
  });

  it('the crossover is held within the schema’s 20–300 Hz; the profiles tried in come along', () => {
    expect(applyCrossoverSweepToDocument(testSystem(), row(400, [{ delayMs: 2.91, invert: false }, { delayMs: 0, invert: false }])).bassManagement.crossoverHz).toBe(300);
    const tried = applyCrossoverSweepToDocument(testSystem(), row(10, [{ delayMs: 2.91, invert: false }, { delayMs: 0, invert: false }]), { subProfile: OTHER_SUB });
    expect(tried.bassManagement.crossoverHz).toBe(20);
    expect(tried.subs.map((s) => s.profileId)).toEqual(['other-sub', 'other-sub']);
  });
});

describe('computeCrossoverSweep: the answer of POST /api/v1/crossover-sweep', () => {
  it('one row per candidate × pairing plus the present setting, ranked 1…n', () => {
    const req = crossoverSweepRequestSchema.parse(crossoverSweepRequestFromDocument(testSystem(), { pairings: [{ mainsFilter: LR4, subFilter: LR4 }], candidatesHz: [70, 80, 90] }));
    const a = computeCrossoverSweep(req);
    expect(a.candidatesHz).toEqual([70, 80, 90]);
    expect(a.speedOfSoundMps).toBe(343.215);
    expect(a.rows.map((r) => r.crossoverHz).sort((x, y) => x - y)).toEqual([70, 80, 80, 90]);
    expect(a.rows.map((r) => r.rank)).toEqual([1, 2, 3, 4]);
    // The present row: the System's own 80 Hz with Butterworth 2 / Linkwitz–Riley 4, unchanged.
    expect(a.rows.filter((r) => r.present).map((r) => [r.crossoverHz, r.mainsFilter, r.subFilter, r.shiftMs, r.flip])).toEqual([[80, BW2, LR4, 0, false]]);
    a.rows.forEach((r) => expect(r.flatnessDb).toBe(r.assessment.flatnessDb));
  });
});
