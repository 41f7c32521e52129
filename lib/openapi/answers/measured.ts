import { z } from 'zod';
import type { PredictAnswer } from '@/lib/system-model/measured';
import type { CompareAnswer } from '@/lib/system-model/measured-compare';
import type { ExtensionAnswer } from '@/lib/system-model/measured-extension';

/**
 * The answers of the measured compute routes (POST /api/v1/measured/predict, /extension, /compare), each tied to the
 * type its handler returns (checked below), strict.
 */

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

const hz = (description: string) => z.number().meta({ description, 'x-unit': 'Hz' });
const db = (description: string) => z.number().meta({ description, 'x-unit': 'dB' });
const ms = (description: string) => z.number().meta({ description, 'x-unit': 'ms' });
const hzList = (description: string) => z.array(z.number()).meta({ description, 'x-unit': 'Hz' });
const dbCurve = (description: string) => z.array(z.number()).meta({ description, 'x-unit': 'dB' });
const degCurve = (description: string) => z.array(z.number()).meta({ description, 'x-unit': '°' });
const band = (description: string) => z.strictObject({ startHz: hz('Lowest frequency.'), stopHz: hz('Highest frequency.') }).meta({ description, 'x-unit': 'Hz' });

// ------------------------------------------------------------------------------------------------ predict

const trace = z.strictObject({
  name: z.string().meta({ description: 'The curve’s name (mains, sub or as given).' }),
  magnitudeDb: dbCurve('Level on the grid, smoothed as asked.'),
  phaseDeg: degCurve('Phase on the grid.'),
  phaseEstimated: z.boolean().meta({ description: 'True when this trace’s phase is a minimum-phase estimate (the file had none).' }),
});
const sum = (description: string) => z.strictObject({ magnitudeDb: dbCurve('Level.'), phaseDeg: degCurve('Phase.') }).meta({ description });

export const predictAnswerSchema = z.strictObject({
  frequencyHz: hzList('The shared log grid: the curves’ common range within 10 Hz … max(1 kHz, 4.5 × crossover).'),
  smoothingFraction: z.number().int().meta({ description: 'As asked (0: none).' }),
  phaseEstimated: z.boolean().meta({ description: 'True when a curve had no phase and its minimum-phase estimate was used (each trace says so too).' }),
  measured: z.array(trace).meta({ description: 'Each curve on the grid, as measured (nothing applied).' }),
  paths: z.array(trace).meta({ description: 'Each curve with its settings applied: filter, processor EQ, gain, delay and polarity.' }),
  predictedSum: sum('The complex sum of the processed curves: what the settings would give at this seat.'),
  measuredSum: sum('The complex sum of the curves as measured (no processing).'),
  alignment: z
    .strictObject({
      keep: z.boolean().meta({ description: 'True when the best setting is under 0.5 dB flatter than the present: keep it.' }),
      reason: z.string().meta({ description: 'One sentence: what the change gains, or why the present setting stays.' }),
      addTo: z.enum(['sub', 'mains']).meta({ description: 'Which output gets the extra delay.' }),
      addDelayMs: ms('The extra delay.'),
      subDelayMs: ms('The sub’s processor delay after the change, as on the Settings sheet.'),
      mainsDelayMs: ms('The mains’ processor delay after the change.'),
      invert: z.boolean().meta({ description: 'The sub’s polarity after the change.' }),
      flipPolarity: z.boolean().meta({ description: 'True when the sub’s polarity changes.' }),
      phaseDifferenceDeg: z.number().meta({ description: 'Phase of the sub minus the mains at the crossover, now.', 'x-unit': '°' }),
      phaseDifferenceAfterDeg: z.number().meta({ description: 'The same after the change.', 'x-unit': '°' }),
      crossoverLevelDb: db('The sum’s level at the crossover after the change.'),
      flatnessBeforeDb: db('Flatness of the present setting (the one measure every screen shows).'),
      flatnessDb: db('Flatness after the change.'),
      timingWindowMs: z.tuple([z.number(), z.number()]).meta({ description: 'The Timing window [from, to], in sub-minus-mains delay settings.', 'x-unit': 'ms' }),
      levelVersusDelay: z
        .strictObject({
          subMinusMainsDelayMs: z.array(z.number()).meta({ description: 'Delay settings scanned, sub minus mains.', 'x-unit': 'ms' }),
          normalDb: dbCurve('Level at the crossover with normal polarity.'),
          invertedDb: dbCurve('Level at the crossover with the sub inverted.'),
        })
        .meta({ description: 'The scan behind the recommendation.' }),
      recommendedSum: z.strictObject({ magnitudeDb: dbCurve('Level.') }).meta({ description: 'The predicted sum with the recommendation applied.' }),
    })
    .nullable()
    .meta({ description: 'Best extra delay and sub polarity found on the measured pair; null when the curves do not cover half to four times the crossover (alignmentNote says why).' }),
  alignmentNote: z.string().nullable().meta({ description: 'Why there is no alignment, when there is none.' }),
});

// ------------------------------------------------------------------------------------------------ extension

const point = (level: string) => z.number().nullable().meta({ description: `The ${level} point; null when the curve does not fall that far within the data.`, 'x-unit': 'Hz' });
const octaves = (point: string) => z.number().nullable().meta({ description: `log2(crossover ÷ the ${point} point), octaves (negative: below it); null when the point is not in the data.` });

export const extensionAnswerSchema = z.strictObject({
  band: band('The band used.'),
  meanLevelDb: db('The power mean of the analysed curve over the band.'),
  pointsHz: z
    .strictObject({
      minus3: point('−3 dB'),
      minus6: point('−6 dB'),
      minus10: point('−10 dB'),
    })
    .meta({
      description: 'Going down from the band, where the curve first falls 3, 6 and 10 dB below the mean (linear in log-frequency between points); null when it does not within the data (the point lies below lowestMeasuredHz).',
      'x-unit': 'Hz',
    }),
  averagedFrom: z.number().int().meta({ description: 'How many seats’ curves were averaged (1: the curve itself).' }),
  names: z.array(z.string()).meta({ description: 'Each curve’s name, in order.' }),
  resampled: z.boolean().meta({ description: 'True when the curves’ grids differed and each was resampled onto the common grid.' }),
  lowestMeasuredHz: hz('The lowest frequency of the analysed curve (of the range the curves share).'),
  curve: z.strictObject({ frequencyHz: hzList('Frequencies.'), magnitudeDb: dbCurve('Levels.') }).meta({ description: 'The analysed curve: the one curve, or the seats’ spatial average.' }),
  crossover: z
    .strictObject({
      crossoverHz: hz('As given.'),
      octavesAboveMinus3: octaves('−3 dB'),
      octavesAboveMinus6: octaves('−6 dB'),
      verdict: z.enum(['clear', 'too-close', 'unknown']).meta({
        description: '"clear" (at least half an octave above the −3 dB point, or half an octave above the data when the curve never falls 3 dB), "too-close", or "unknown" (the −3 dB point lies below the data, too near to judge).',
      }),
      rule: z.string().meta({ description: 'The rule in words (common practice).' }),
      summary: z.string().meta({ description: 'One sentence: what the verdict means for this crossover.' }),
    })
    .optional()
    .meta({ description: 'With crossoverHz: the crossover judged against the −3 and −6 dB points.' }),
});

// ------------------------------------------------------------------------------------------------ compare

export const compareAnswerSchema = z.strictObject({
  frequencyHz: hzList('The common log grid: from the highest first frequency to the lowest last frequency of all runs.'),
  rangeHz: band('The range every run covers (at least an octave).'),
  smoothingFraction: z.number().int().meta({ description: 'As asked (0: none).' }),
  levels: z.enum(['as measured', 'matched']).meta({ description: 'Whether the runs’ levels were matched over matchLevelBandHz.' }),
  matchLevelBandHz: z
    .strictObject({ startHz: hz('Lowest frequency.'), stopHz: hz('Highest frequency.') })
    .nullable()
    .meta({ description: 'The band used for level matching, or null.', 'x-unit': 'Hz' }),
  reference: z.strictObject({ name: z.string().meta({ description: 'Its name.' }) }).meta({ description: 'The reference run.' }),
  differences: z
    .array(
      z.strictObject({
        name: z.string().meta({ description: 'The run’s name.' }),
        differenceDb: dbCurve('(run + levelOffsetDb) − reference at each grid frequency, smoothed as asked.'),
        levelOffsetDb: db('What level matching added to the run (0 as measured).'),
        minDb: db('The lowest difference.'),
        maxDb: db('The highest difference.'),
        largest: z.strictObject({ differenceDb: db('The difference, signed.'), frequencyHz: hz('Where it is.') }).meta({ description: 'The difference of largest size.' }),
      }),
    )
    .meta({ description: 'Per other run, in order.' }),
});

const _predict: Same<z.output<typeof predictAnswerSchema>, PredictAnswer> = true;
const _extension: Same<z.output<typeof extensionAnswerSchema>, ExtensionAnswer> = true;
const _compare: Same<z.output<typeof compareAnswerSchema>, CompareAnswer> = true;
void [_predict, _extension, _compare];
