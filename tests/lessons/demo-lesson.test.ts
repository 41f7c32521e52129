/**
 * The demo Lesson teaches what it says, computed by dsp/ through the same glue the Presenter view
 * uses (published, Linkwitz 1976: LR4 sums flat, inverted → null; BW2 inverted → +3.01 dB, same polarity →
 * null; 1 m at 20 °C = 2.914 ms = 83.9° at 80 Hz).
 */
import { describe, expect, it } from 'vitest';
import { demoLesson } from '@/lib/demo/lessons';
import { computeLessonFrame } from '@/lib/system-model/lesson-frame';
import { applyLessonSweepToDocument, sweepValueAt } from '@/lib/system-model/lesson-sweep';
import { systemDocumentSchema } from '@/lib/validations/system';
import { sweepSchema } from '@/lib/validations/lesson';

const steps = demoLesson().steps;
const metrics = (i: number) => computeLessonFrame(steps[i]!.document)!.metrics!;
const flatness = (i: number) => computeLessonFrame(steps[i]!.document)!.assessment!.flatnessDb;

describe('demo Lesson "Why the sub and mains cancel"', () => {
  it('has at least five valid Steps', () => {
    expect(steps.length).toBeGreaterThanOrEqual(5);
    for (const s of steps) {
      systemDocumentSchema.parse(s.document);
      if (s.sweep) sweepSchema.parse(s.sweep);
    }
  });
  it('LR4 same polarity sums flat within 0.01 dB (Linkwitz 1976)', () => {
    expect(flatness(0)).toBeLessThan(0.01);
    expect(metrics(0).sumLevelDb).toBeCloseTo(0, 2);
  });
  it('LR4 with the sub inverted: a deep null at the crossover', () => {
    expect(metrics(1).sumLevelDb).toBeLessThan(-60);
  });
  it('BW2 inverted: +3.01 dB at the crossover; same polarity: a null', () => {
    expect(metrics(2).sumLevelDb).toBeCloseTo(3.01, 1);
    expect(metrics(3).sumLevelDb).toBeLessThan(-60);
  });
  it('one metre of extra sub distance is 83.9° at 80 Hz, and the right distance setting (2.91 ms on the mains) fixes it', () => {
    expect(metrics(4).phaseDifferenceDeg).toBeCloseTo(83.9, 0);
    expect(Math.abs(metrics(5).phaseDifferenceDeg)).toBeLessThan(0.5);
    expect(flatness(5)).toBeLessThan(0.05);
  });
  it('the crossover sweep runs 60 → 120 Hz and changes the sum', () => {
    const s = steps[6]!;
    expect(s.sweep).toMatchObject({ parameter: 'crossoverHz', from: 60, to: 120 });
    const at = (p: number) => computeLessonFrame(applyLessonSweepToDocument(s.document, s.sweep!, sweepValueAt(s.sweep!, p)))!;
    expect(at(0).crossoverHz).toBeCloseTo(60, 6);
    expect(at(1).crossoverHz).toBeCloseTo(120, 6);
    expect(at(0.5).crossoverHz).toBeCloseTo(Math.sqrt(60 * 120), 6);
    expect(at(0).metrics!.sumLevelDb).not.toBeCloseTo(at(1).metrics!.sumLevelDb, 1);
  });
});
