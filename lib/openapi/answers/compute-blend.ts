import { z } from 'zod';
import { FLATNESS_DEFINITION } from '@/dsp';
import type { AdviceAnswer, AssessmentAnswer, SettingsAnswer } from '@/lib/system-model/advice-answer';
import type { BlendAnswer } from '@/lib/system-model/blend';
import type { CrossoverSweepAnswer } from '@/lib/system-model/crossover-sweep';
import type { MeasuredBasis } from '@/lib/system-model/measured-sources';
import type { TimingAnswer } from '@/lib/system-model/timing';
import { filterShapeSchema } from '@/lib/validations/compute-blend';

/** The answers of POST /api/v1/blend, /api/v1/crossover-sweep and /api/v1/timing, tied to their TypeScript types below. */

const FLATNESS_TEXT = FLATNESS_DEFINITION.text;
const unit = (u: string, description: string) => ({ description, 'x-unit': u });
const numbers = (u: string, description: string) => z.array(z.number()).meta(unit(u, description));
const bandHz = z.tuple([z.number(), z.number()]).meta(unit('Hz', 'The band the flatness measure looks at: [fc/2, 2·fc].'));

const assessmentSchema = z
  .strictObject({
    flatnessDb: z.number().meta(unit('dB', `The flatness measure: the ${FLATNESS_TEXT}, ≥ 0, 0.01 dB (0: perfectly flat).`)),
    maxDeviationDb: z.number().meta(unit('dB', 'The same deviation with its sign (negative: a dip), 0.01 dB.')),
    maxDeviationHz: z.number().meta(unit('Hz', 'Where that deviation is, 0.1 Hz.')),
    deepestDipDb: z.number().meta(unit('dB', 'Lowest level within the band relative to the reference (positive when the whole band stands above it).')),
    deepestDipHz: z.number().meta(unit('Hz', 'Where the deepest dip is.')),
    crossoverLevelDb: z.number().meta(unit('dB', 'The sum at fc relative to 4·fc.')),
    minus3DbHz: z.number().nullable().meta(unit('Hz', 'System −3 dB point, 0.1 Hz; null when the sum is still above it at 5 Hz.')),
    bandHz,
  })
  .meta({ id: 'Assessment', description: 'One setting of the whole system assessed, levels relative to the sum at 4·fc (two octaves above the crossover).' });

const settingsSchema = z
  .strictObject({
    mainsDelayMs: z.number().meta(unit('ms', 'Processor delay of the main channel, ≥ 0, 0.01 ms.')),
    subs: z
      .array(
        z.strictObject({
          name: z.string().meta({ description: 'The sub, as named in the request.' }),
          delayMs: z.number().meta(unit('ms', 'Processor delay of this sub, ≥ 0, 0.01 ms.')),
          invert: z.boolean().meta({ description: 'Polarity inverted.' }),
        }),
      )
      .meta({ description: 'Every sub, in request order.' }),
  })
  .meta({
    id: 'ProcessorSettings',
    description: 'The processor delays and polarities to run as they stand (a delay all sources would share is taken out: it changes no level).',
  });

const adviceShape = {
  keep: z.boolean().meta({ description: 'True when no change is worth making: the present setting stays.' }),
  reason: z.string().meta({ description: 'One sentence: what the advice gains, or why the present setting stays.' }),
  set: settingsSchema,
  before: assessmentSchema,
  after: assessmentSchema,
  gainDb: z.number().meta(unit('dB', 'Flatness before minus after (positive: flatter); 0 when keep.')),
  extensionLossOctaves: z.number().meta({ description: 'How far the system −3 dB point moved up, octaves (negative: deeper); 0 when keep.' }),
  bassCutDb: z.number().meta(unit('dB', 'Level lost over the octave fc/4 … fc/2 (negative: gained); 0 when keep.')),
};
const adviceSchema = z.strictObject(adviceShape).meta({ id: 'Advice', description: 'A piece of advice proven on the whole system, or "keep" with the reason.' });

const measuredBasisSchema = z
  .strictObject({
    sources: z
      .array(
        z.strictObject({
          name: z.string().meta({ description: 'The measured source.' }),
          startHz: z.number().meta(unit('Hz', 'Lowest frequency its curve covers, 0.1 Hz.')),
          stopHz: z.number().meta(unit('Hz', 'Highest frequency its curve covers, 0.1 Hz.')),
          phaseEstimated: z.boolean().meta({ description: 'Its phase is a minimum-phase estimate (none was measured).' }),
        }),
      )
      .meta({ description: 'Each measured source.' }),
    crossoverRangeHz: z
      .tuple([z.number(), z.number()])
      .nullable()
      .meta(unit('Hz', 'The crossover points these curves can judge: each needs fc/2 … 4·fc on the mains and fc/2 … 2·fc on the subs.')),
    mainsMinus3DbHz: z.number().nullable().meta(unit('Hz', "The mains' in-room −3 dB point against their level over 200 Hz–2 kHz, 0.1 Hz; null when not measured or not reached.")),
    note: z.string().meta({ description: 'One paragraph to show beside the results: what was measured and what is an estimate.' }),
  })
  .nullable()
  .meta({ id: 'MeasuredBasis', description: 'Null on the model; on measurements, which curves were used and what they can judge.' });

const speedOfSoundMps = z.number().meta(unit('m/s', 'c at temperatureC (331.3·√(1 + T/273.15)), 0.001 m/s.'));
const flatnessDefinition = z.string().meta({ description: `What flatness means: "${FLATNESS_TEXT}".` });

const blendMetricsSchema = z
  .strictObject({
    crossoverHz: z.number().meta(unit('Hz', 'Where the read-outs are taken.')),
    crossoverSource: z.enum(['request', 'filters']).meta({ description: "'request' when crossoverHz was sent; 'filters' when taken from the paths' corners." }),
    mainsPath: z.number().int().meta({ description: 'The path read as mains: the first high-pass, else 0.' }),
    subPath: z.number().int().nullable().meta({ description: 'The path read as sub: the first low-pass, else the next path; null with one path.' }),
    pathLevelsDb: numbers('dB', 'Each path’s level at the crossover, in path order.'),
    sumLevelDb: z.number().meta(unit('dB', 'The sum’s level at the crossover.')),
    phaseDifferenceDeg: z.number().nullable().meta(unit('°', 'Mains phase minus sub phase at the crossover, (−180, 180]; null with one path.')),
    referenceHz: z.number().meta(unit('Hz', 'The reference of the flatness measure: 4·fc, two octaves above the crossover.')),
    referenceLevelDb: z.number().meta(unit('dB', 'The sum at 4·fc, evaluated on its own grid whatever grid the plot asks for.')),
    flatnessDb: z.number().meta(unit('dB', `The one flatness measure (the number Timing, the Crossover sweep and every screen use): the ${FLATNESS_TEXT}, at 48 points per octave; ≥ 0, 0.01 dB.`)),
    maxDeviationDb: z.number().meta(unit('dB', 'The same deviation with its sign (negative: a dip), 0.01 dB.')),
    maxDeviationHz: z.number().meta(unit('Hz', 'Where it is, 0.1 Hz.')),
    bandHz,
    deepestDipDb: z.number().meta(unit('dB', 'Lowest level within the band relative to the reference.')),
    deepestDipHz: z.number().meta(unit('Hz', 'Where the deepest dip is.')),
    minus3DbHz: z.number().nullable().meta(unit('Hz', 'System −3 dB point at the low end, looking up from 5 Hz; null when the sum is still above it at 5 Hz.')),
  })
  .nullable()
  .meta({ description: 'The read-outs at the crossover; null when no path is filtered (and no crossoverHz was sent).' });

export const blendAnswerSchema = z
  .strictObject({
    frequencyHz: numbers('Hz', 'The log grid, 0.001 Hz.'),
    paths: z
      .array(
        z.strictObject({
          name: z.string().meta({ description: 'The path, as named in the request.' }),
          magnitudeDb: numbers('dB', 'Level at the listener, 0.001 dB (an exact cancellation reads −300 dB).'),
          phaseDeg: numbers('°', 'Phase wrapped to (−180, 180], 0.01°.'),
        }),
      )
      .meta({ description: 'Each path at the listener, in request order.' }),
    sum: z
      .strictObject({
        magnitudeDb: numbers('dB', 'Level of the complex sum, 0.001 dB.'),
        phaseDeg: numbers('°', 'Phase of the sum wrapped to (−180, 180], 0.01°.'),
        groupDelayMs: numbers('ms', 'Group delay of the sum (delays and distances included), 0.001 ms.'),
      })
      .meta({ description: 'The complex sum of every path.' }),
    metrics: blendMetricsSchema,
  })
  .meta({ id: 'BlendAnswer' });

const arrivalShape = {
  name: z.string().meta({ description: 'As named in the request.' }),
  distanceM: z.number().nullable().meta(unit('m', 'The air path (on a measurement: the distance its arrival time stands for), 0.01 m; null when unknown.')),
  arrivalMs: z.number().nullable().meta(unit('ms', 'Air time distanceM / c, or the measured arrival of an impulse response, 0.001 ms; null when unknown.')),
  arrivalFrom: z
    .enum(['distance', 'measured'])
    .nullable()
    .meta({ description: "'distance' on the model; 'measured' from an impulse response's peak; null for a curve without an arrival." }),
  delayMs: z.number().meta(unit('ms', 'Processor delay set now, 0.01 ms.')),
  totalMs: z.number().nullable().meta(unit('ms', 'arrivalMs + delayMs; null when the arrival is unknown.')),
};

const timingSubSchema = z.strictObject({
  ...arrivalShape,
  invert: z.boolean().meta({ description: 'Polarity inverted now (as sent).' }),
  leadMs: z.number().nullable().meta(unit('ms', "How much earlier this sub's sound arrives than the mains' (processor delays included; negative: later); null when an arrival is unknown.")),
  phaseDifferenceDeg: z.number().meta(unit('°', 'Mains minus sub phase at the crossover with the present settings, filters’ own phase and polarity included, (−180, 180], 0.1°.')),
  delayPhaseDeg: z.number().nullable().meta(unit('°', 'The part from arrival and processor delays alone, 360·fc·(sub total − mains total); null when an arrival is unknown.')),
  filterPhaseDeg: z.number().nullable().meta(unit('°', "The rest: the filters', roll-offs' and polarity's own phase; null when an arrival is unknown.")),
  advice: z
    .strictObject({
      ...adviceShape,
      shiftMs: z.number().meta(unit('ms', "This sub's delay moved by this (negative: the main channel and the other subs get −shiftMs instead); 0 when keep.")),
      flip: z.boolean().meta({ description: "This sub's polarity flipped; false when keep." }),
    })
    .meta({ description: "This sub's delay and polarity with the main channel and every other sub as they are." }),
  timingWindowMs: z
    .tuple([z.number(), z.number()])
    .meta(unit('ms', "Timing window: this sub's delay setting minus the mains' over which the flatness stays within 1 dB of the advised setting's (same polarity), 0.01 ms.")),
  flatnessVersusDelay: z
    .strictObject({
      subMinusMainsDelayMs: numbers('ms', "This sub's delay setting minus the mains', from the present one −maxDelayMs to +maxDelayMs, 2·stepMs apart."),
      normalDb: numbers('dB', 'The flatness measure of the whole system with the sub not inverted.'),
      invertedDb: numbers('dB', 'The same with the sub inverted.'),
    })
    .meta({ description: "The flatness of the whole system against this sub's delay, both polarities." }),
});

export const timingAnswerSchema = z
  .strictObject({
    speedOfSoundMps,
    crossoverHz: z.number().meta(unit('Hz', 'The crossover of the request.')),
    flatness: z.strictObject({ definition: flatnessDefinition, bandHz }).meta({ description: 'What flatness means in this answer.' }),
    present: assessmentSchema,
    mains: z.strictObject(arrivalShape).meta({ description: 'The main channel: its distance, arrival and delay.' }),
    subs: z.array(timingSubSchema).meta({ description: 'Every sub, in request order.' }),
    measured: measuredBasisSchema,
    group: adviceSchema
      .nullable()
      .meta({ description: 'With 2 or more subs, one piece of advice for all of them (coordinate descent over the subs as a group and each alone); null with one sub.' }),
  })
  .meta({ id: 'TimingAnswer' });

const sweepRowSchema = z.strictObject({
  rank: z.number().int().meta({ description: '1 = best; no row ranks above the present one unless worthIt.' }),
  present: z.boolean().meta({ description: "The present setting, unchanged (shiftMs 0, flip false, set = the request's delays and polarities). Exactly one row." }),
  crossoverHz: z.number().meta(unit('Hz', 'The crossover point of the row.')),
  mainsFilter: filterShapeSchema,
  subFilter: filterShapeSchema,
  shiftMs: z.number().meta(unit('ms', "Every sub's delay moved by this, 0.01 ms (negative: the main channel gets −shiftMs instead); 0 on the present row.")),
  flip: z.boolean().meta({ description: "Every sub's polarity flipped from the present." }),
  set: settingsSchema,
  flatnessDb: z.number().meta(unit('dB', "The flatness measure at the row's setting (as assessment.flatnessDb), 0.01 dB.")),
  assessment: assessmentSchema,
  gainDb: z.number().meta(unit('dB', "Against the present setting: its flatness minus this row's (positive: flatter).")),
  extensionLossOctaves: z.number().meta({ description: 'How far the system −3 dB point moved up against the present setting, octaves (negative: deeper), 0.001.' }),
  bassCutDb: z.number().meta(unit('dB', 'Level lost against the present setting over the octave fc/4 … fc/2 of the lower of the two crossovers (negative: gained).')),
  keepsBass: z.boolean().meta({ description: 'extensionLossOctaves ≤ 1/3 and bassCutDb ≤ 1 dB.' }),
  nearMainsRolloff: z.boolean().meta({ description: "crossoverHz lies below lowestClearHz (too close to the mains' own roll-off)." }),
  worthIt: z.boolean().meta({ description: 'Worth changing to: keeps the bass, no less flat than the present and at least 0.5 dB flatter, or clear of the roll-off the present is near. Always false on the present row.' }),
  mainsLowBassDb: z.number().meta(unit('dB', 'How much low bass the mains still carry: the mains path (high-pass × roll-off) one octave below the crossover against two octaves above it.')),
});

export const crossoverSweepAnswerSchema = z
  .strictObject({
    speedOfSoundMps,
    flatness: z.strictObject({ definition: flatnessDefinition }).meta({ description: 'What flatnessDb means.' }),
    mainsMinus3DbHz: z.number().nullable().meta(unit('Hz', "The main speaker's own −3 dB point from mains.rolloff, 0.1 Hz; null with no roll-off. On measured mains: their in-room −3 dB point.")),
    lowestClearHz: z.number().nullable().meta(unit('Hz', "The lowest crossover clear of the mains' roll-off: mainsMinus3DbHz × √2, half an octave above it (common practice); null with no roll-off.")),
    candidatesHz: numbers('Hz', 'The candidates tried.'),
    rows: z.array(sweepRowSchema).meta({ description: 'One row per candidate × pairing, plus the present setting as a row of its own; best first.' }),
    measured: measuredBasisSchema,
  })
  .meta({ id: 'CrossoverSweepAnswer' });

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const _assessment: Same<z.output<typeof assessmentSchema>, AssessmentAnswer> = true;
const _settings: Same<z.output<typeof settingsSchema>, SettingsAnswer> = true;
const _advice: Same<z.output<typeof adviceSchema>, AdviceAnswer> = true;
const _measured: Same<z.output<typeof measuredBasisSchema>, MeasuredBasis | null> = true;
const _blend: Same<z.output<typeof blendAnswerSchema>, BlendAnswer> = true;
const _timing: Same<z.output<typeof timingAnswerSchema>, TimingAnswer> = true;
const _sweep: Same<z.output<typeof crossoverSweepAnswerSchema>, CrossoverSweepAnswer> = true;
void [_assessment, _settings, _advice, _measured, _blend, _timing, _sweep];
