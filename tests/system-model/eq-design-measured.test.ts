/**
 * The EQ designer on stored measurements. The invented "measurements" are the modal model's own responses (each sub
 * alone at each seat, with phase, as a microphone hears it without processing; or every sub together through the
 * processor, magnitude only), so the measured answer must be the model's answer: the same filters, the same residual.
 */
import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, modalTransfers, rolloffResponse } from '@/dsp';
import { computeEqDesign, eqDesignModelCurve, eqDesignRequestFromDocument } from '@/lib/system-model/eq-design';
import { computeMeasuredEqDesign, eqDesignMeasuredRequestFromDocument, type EqMeasurementRef, type StoredCurve } from '@/lib/system-model/eq-design-measured';
import { eqDesignMeasuredRequestSchema } from '@/lib/validations/compute-eq-design';
import type { SystemDocument } from '@/lib/validations/system';
import { testSystem } from './test-system';

// The files are on the design grid itself (15–200 Hz at 48 points per octave), so resampling them changes nothing.
const FILE_GRID = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
const deg = (re: number, im: number) => (Math.atan2(im, re) * 180) / Math.PI;

/** Each sub alone at each seat: its modal transfer with all its boxes × its natural roll-offs (no processing), with phase. */
function perSubFiles(doc: SystemDocument): Map<string, StoredCurve> {
  const t = modalTransfers({ room: doc.room, sourcesM: doc.subs.map((s) => ({ x: s.xM, y: s.yM, z: s.zM })), receiversM: doc.seats.map((s) => ({ x: s.xM, y: s.yM, z: s.zM })), frequencyHz: FILE_GRID, rt60S: doc.room.rt60S, temperatureC: doc.room.temperatureC, maxModeHz: 300 });
  const ro = rolloffResponse({ rolloff: [{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 180, q: 0.7 }], frequencyHz: FILE_GRID });
  const files = new Map<string, StoredCurve>();
  doc.subs.forEach((sub, s) =>
    doc.seats.forEach((seat, k) => {
      const h = t.transfers[s]![k]!;
      const re = Array.from(FILE_GRID, (_, i) => sub.count * (h.re[i]! * ro.re[i]! - h.im[i]! * ro.im[i]!));
      const im = Array.from(FILE_GRID, (_, i) => sub.count * (h.re[i]! * ro.im[i]! + h.im[i]! * ro.re[i]!));
      files.set(`${sub.name}@${seat.name}`, { frequencyHz: Array.from(FILE_GRID), magnitudeDb: re.map((r, i) => 10 * Math.log10(r * r + im[i]! * im[i]!)), phaseDeg: re.map((r, i) => deg(r, im[i]!)) });
    }),
  );
  return files;
}

const uuid = (i: number) => `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`;

/** Library entries for files keyed "sub@seat" (ids are UUIDs in key order, as stored measurements have). */
const refsOf = (files: Map<string, StoredCurve>, role: (key: string) => string, hasPhase = true): EqMeasurementRef[] =>
  [...files.keys()].map((key, i) => ({ id: uuid(i), name: `${key} (invented)`, seat: key.split('@')[1]!, role: role(key), hasPhase }));

/** The stored points of each measurement the request names. */
const curvesFor = (files: Map<string, StoredCurve>, request: { measurements: { measurementId: string }[] }) => {
  const byId = new Map([...files.values()].map((c, i) => [uuid(i), c]));
  return request.measurements.map((m) => byId.get(m.measurementId)!);
};

function modelAnswer(doc: SystemDocument, at: 'mlp' | 'average') {
  const r = eqDesignRequestFromDocument(doc, { at });
  if (!r.ok) throw new Error(r.reason);
  return computeEqDesign(r.request);
}

function pick(doc: SystemDocument, files: Map<string, StoredCurve>, refs: EqMeasurementRef[], at: 'mlp' | 'average') {
  const r = eqDesignMeasuredRequestFromDocument(doc, refs, { at });
  if (!r.ok) throw new Error(r.reason);
  return { request: r.request, used: r.used, curves: curvesFor(files, r.request) };
}

describe('computeMeasuredEqDesign: measurements that are the model give the model’s answer', () => {
  const doc = testSystem();
  const files = perSubFiles(doc);

  it.each<['mlp' | 'average', string]>([
    ['mlp', 'measured at Centre chair (each sub alone with phase, summed with its present settings)'],
    ['average', 'measured, power average of 2 seats (each sub alone with phase, summed with its present settings)'],
  ])('each sub alone, with phase, at %s', (at, input) => {
    const { request, used, curves } = pick(doc, files, refsOf(files, (k) => k.split('@')[0]!), at);
    expect(used.every((u) => u.sub !== undefined)).toBe(true);
    const answer = computeMeasuredEqDesign(request, curves);
    const model = modelAnswer(doc, at);
    expect(answer.input).toBe(input);
    expect(answer.source).toBe('measured');
    expect(answer.filters).toEqual(model.filters);
    expect(answer.residual).toEqual(model.residual);
    answer.inputDb.forEach((v, i) => expect(Math.abs(v - model.inputDb[i]!)).toBeLessThanOrEqual(0.011));
  });

  it('every sub together through the processor, magnitude only ("all subs"), power-averaged over the seats', () => {
    const together = new Map<string, StoredCurve>();
    for (const seat of doc.seats) {
      const r = eqDesignRequestFromDocument(doc);
      if (!r.ok) throw new Error(r.reason);
      const c = eqDesignModelCurve({ ...r.request, at: seat.name });
      together.set(`all@${seat.name}`, { frequencyHz: Array.from(c.frequencyHz), magnitudeDb: Array.from(c.magnitudeDb), phaseDeg: null });
    }
    const { request, curves } = pick(doc, together, refsOf(together, () => 'All subs', false), 'average');
    expect(request.subs).toBeUndefined();
    const answer = computeMeasuredEqDesign(request, curves);
    expect(answer.input).toBe('measured, power average of 2 seats (every sub playing together)');
    const model = modelAnswer(doc, 'average');
    expect(answer.filters).toEqual(model.filters);
    answer.inputDb.forEach((v, i) => expect(Math.abs(v - model.inputDb[i]!)).toBeLessThanOrEqual(0.011));
  });

  it('one sub without phase: its magnitude is enough (there is nothing to sum)', () => {
    const one = { ...doc, subs: [doc.subs[1]!] };
    const noPhase = new Map([...perSubFiles(one)].map(([k, c]) => [k, { ...c, phaseDeg: null }]));
    const { request, curves } = pick(one, noPhase, refsOf(noPhase, (k) => k.split('@')[0]!, false), 'mlp');
    const answer = computeMeasuredEqDesign(request, curves);
    expect(answer.input).toBe('measured at Centre chair (the sub alone, magnitude)');
    expect(answer.filters).toEqual(modelAnswer(one, 'mlp').filters);
  });

  it('refuses per-sub files without phase for two subs, and a file that does not cover the band, naming the measurement', () => {
    const noPhase = [...files.values()].map((c) => ({ ...c, phaseDeg: null }));
    const request = eqDesignMeasuredRequestSchema.parse({
      subs: doc.subs.map((s) => ({ name: s.name })),
      measurements: doc.subs.map((s, i) => ({ seat: 'Centre chair', sub: s.name, measurementId: uuid(i) })),
    });
    expect(() => computeMeasuredEqDesign(request, [files.get('Sub A@Centre chair')!, noPhase[0]!])).toThrow(/measurements\.1\.measurementId: Sub B at Centre chair has no phase/);
    const b = files.get('Sub B@Centre chair')!;
    const short = { frequencyHz: b.frequencyHz.slice(24), magnitudeDb: b.magnitudeDb.slice(24), phaseDeg: b.phaseDeg!.slice(24) };
    expect(() => computeMeasuredEqDesign(request, [files.get('Sub A@Centre chair')!, short])).toThrow(/measurements\.1\.measurementId: covers 21\.21–198\.9 Hz; the band needs 20–120 Hz/);
  });
});

describe('eqDesignMeasuredRequestFromDocument: which files a System offers', () => {
  const doc = testSystem();
  const files = perSubFiles(doc);
  const subRole = (k: string) => k.split('@')[0]!;

  it('at the MLP: each sub’s file there, newest first, with the present settings the files lack (the whole processor delay)', () => {
    const refs = refsOf(files, subRole);
    const newer = { ...refs.find((m) => m.name.startsWith('Sub A@Centre chair'))!, id: uuid(99), name: 'newer take (invented)' };
    const r = eqDesignMeasuredRequestFromDocument(doc, [newer, ...refs], {});
    if (!r.ok) throw new Error(r.reason);
    expect(r.used.map((u) => `${u.sub}@${u.seat}`)).toEqual(['Sub A@Centre chair', 'Sub B@Centre chair']);
    expect(r.used[0]!.name).toBe('newer take (invented)');
    const model = eqDesignRequestFromDocument(doc);
    if (!model.ok) throw new Error(model.reason);
    r.request.subs!.forEach((s, i) => {
      expect(s.delayMs).toBe(model.request.subs[i]!.delayMs);
      expect(s.gainDb).toBe(doc.subs[i]!.gainDb);
      expect(s.invert).toBe(doc.subs[i]!.invert);
    });
    expect(r.request.lowpass).toEqual({ family: 'linkwitz-riley', order: 4, cornerHz: 80 });
  });

  it('files of two subs without phase are not used; a file of all subs together is', () => {
    const noPhase = refsOf(files, subRole, false);
    expect(eqDesignMeasuredRequestFromDocument(doc, noPhase)).toMatchObject({ ok: false, reason: expect.stringMatching(/No usable measurement at the MLP \(Centre chair\)/) });
    const all: EqMeasurementRef = { id: uuid(98), name: 'all subs at the centre chair (invented)', seat: 'centre chair ', role: 'ALL SUBS', hasPhase: false };
    const r = eqDesignMeasuredRequestFromDocument(doc, [...noPhase, all]);
    expect(r).toMatchObject({ ok: true, used: [{ seat: 'Centre chair', name: all.name }] });
  });

  it('over every seat: the kind of file that covers more seats', () => {
    const refs = refsOf(files, subRole).filter((m) => m.seat === 'Centre chair');
    const all = doc.seats.map((s, i) => ({ id: uuid(90 + i), name: `all subs ${i}`, seat: s.name, role: 'subs', hasPhase: false }));
    expect(eqDesignMeasuredRequestFromDocument(doc, [...refs, ...all], { at: 'average' })).toMatchObject({ ok: true, used: [{ seat: 'Centre chair' }, { seat: 'Side chair' }] });
    const r = eqDesignMeasuredRequestFromDocument(doc, refs, { at: 'average' });
    expect(r).toMatchObject({ ok: true });
    if (r.ok) expect(r.used.map((u) => u.seat)).toEqual(['Centre chair', 'Centre chair']);
  });
});
