import { z } from 'zod';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';

/** The answer of POST /api/v1/seat-balance, tied to the type its handler returns (checked below), strict. */

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

const hz = (description: string) => z.number().meta({ description, 'x-unit': 'Hz' });
const db = (description: string) => z.number().meta({ description, 'x-unit': 'dB' });
const m = (description: string) => z.number().meta({ description, 'x-unit': 'm' });
const levels = (description: string) => z.array(z.number()).meta({ description, 'x-unit': 'dB' });

const summary = (description: string) =>
  z
    .strictObject({
      meanSpreadDb: db('Mean over the band of the loudest minus the quietest seat at each frequency (room-response’s meanSpreadDb).'),
      maxSpreadDb: db('The largest seat-to-seat spread in the band.'),
      maxSpreadHz: hz('Where it is.'),
      meanLevelDb: db('The seats’ mean level (power mean over seats and band), relative to every sub at 0 ms / 0 dB / normal polarity.'),
    })
    .meta({ description });

const subSetting = z
  .strictObject({
    name: z.string().meta({ description: 'The sub, in request order.' }),
    candidate: z.string().optional().meta({ description: 'In a ranked placement: the candidate position the sub stands at.' }),
    xM: m('Where it stands (model and placements).').optional(),
    yM: m('Where it stands.').optional(),
    zM: m('Where it stands.').optional(),
    delayMs: z.number().meta({ description: 'Processor delay, 0.01 ms steps; the smallest is 0.', 'x-unit': 'ms' }),
    gainDb: db('Gain, 0.1 dB steps; moved down together where the floor and limits allow, so cuts are preferred to boosts.'),
    invert: z.boolean().meta({ description: 'Polarity inverted.' }),
  })
  .meta({ description: 'One sub’s setting.' });

export const seatBalanceAnswerSchema = z.strictObject({
  source: z.enum(['model', 'measured']).meta({ description: 'What the answer was computed from: the modal model or stored measurements.' }),
  objective: z.string().meta({ description: 'The objective in words.' }),
  band: z.strictObject({ startHz: hz('The band’s start.'), stopHz: hz('The band’s end.') }).meta({ description: 'The band used.' }),
  grid: z.strictObject({ startHz: hz('The grid’s start.'), stopHz: hz('The grid’s end.'), pointsPerOctave: z.number().meta({ description: 'Points per octave.' }) }).meta({ description: 'The grid used.' }),
  limits: z
    .strictObject({
      maxDelayMs: z.number().meta({ description: 'Longest delay tried.', 'x-unit': 'ms' }),
      minGainDb: db('Deepest cut allowed.'),
      maxGainDb: db('Largest boost allowed.'),
      allowInvert: z.boolean().meta({ description: 'Polarity inversion allowed.' }),
      maxOutputLossDb: db('The output floor.'),
    })
    .meta({ description: 'The limits used.' }),
  subs: z.array(subSetting).meta({ description: 'Each sub’s setting, in request order. Never worse than every sub at 0 ms / 0 dB / normal polarity.' }),
  before: summary('Every sub at 0 ms, 0 dB, normal polarity (meanLevelDb 0 by definition).'),
  after: summary('With the answer’s settings; meanLevelDb never below −maxOutputLossDb.'),
  present: summary('With the present settings (measured request’s `present`); absent otherwise.').optional(),
  evaluated: z.number().int().meta({ description: 'Candidate settings the search evaluated (a seeded differential evolution over the whole box, restarted four times, each refined by a pattern search with polarity flips).' }),
  frequencyHz: z.array(z.number()).meta({ description: 'The grid points inside the band.', 'x-unit': 'Hz' }),
  seats: z
    .array(
      z.strictObject({
        name: z.string().meta({ description: 'The seat.' }),
        weight: z.number().meta({ description: 'Its weight.' }),
        beforeDb: levels('Level at frequencyHz before.'),
        afterDb: levels('Level at frequencyHz after.'),
        presentDb: levels('Level at frequencyHz with the present settings.').optional(),
      }),
    )
    .meta({ description: 'Each seat’s level at frequencyHz; 0 dB is the mean level before.' }),
  spread: z
    .strictObject({ beforeDb: levels('Before.'), afterDb: levels('After.'), presentDb: levels('With the present settings.').optional() })
    .meta({ description: 'Loudest minus quietest seat at each frequency.' }),
  placements: z
    .strictObject({
      candidates: z
        .array(z.strictObject({ name: z.string().meta({ description: 'The position.' }), xM: m('x.'), yM: m('y.'), zM: m('z.') }))
        .meta({ description: 'The candidate positions: the defaults, then yours.' }),
      totalCombinations: z.number().int().meta({ description: 'How many combinations there are.' }),
      rankedCombinations: z.number().int().meta({ description: 'How many were ranked.' }),
      capped: z.boolean().meta({ description: 'True when the combinations were sampled (more than maxCombinations).' }),
      ranked: z
        .array(z.strictObject({ subs: z.array(subSetting).meta({ description: 'Each sub at its candidate position with its setting.' }), before: summary('Every sub there at 0 ms / 0 dB.'), after: summary('With its optimised settings.') }))
        .meta({ description: 'The best five, best first.' }),
    })
    .optional()
    .meta({ description: 'With `placement`: the positions ranked.' }),
});

const _seatBalance: Same<z.output<typeof seatBalanceAnswerSchema>, SeatBalanceAnswer> = true;
void _seatBalance;
