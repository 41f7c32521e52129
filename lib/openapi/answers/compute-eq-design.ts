import { z } from 'zod';
import { BIQUAD_CONVENTION, RESIDUAL_DEFINITION } from '@/dsp';
import type { EqDesignAnswer } from '@/lib/system-model/eq-design';

/** The answer of POST /api/v1/eq-design, tied to the type its handler returns (checked below), strict. */

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

const hz = (description: string) => z.number().meta({ description, 'x-unit': 'Hz' });
const db = (description: string) => z.number().meta({ description, 'x-unit': 'dB' });
const dbCurve = (description: string) => z.array(z.number()).meta({ description, 'x-unit': 'dB' });
const coefficient = (name: string) => z.number().meta({ description: `${name}, full double precision.` });
const levels = (description: string) => z.strictObject({ rmsDb: db('RMS distance from the target over the band.'), maxDb: db('Largest distance from the target over the band.') }).meta({ description });

export const eqDesignAnswerSchema = z.strictObject({
  source: z.enum(['curve', 'model', 'measured']).meta({ description: 'Which input was used.' }),
  input: z.string().meta({ description: 'The input in words (“model at Row 1 centre”, “measured, power average of 3 seats (every sub playing together)”).' }),
  seats: z.array(z.string()).meta({ description: 'The seats the input came from (none for a curve).' }),
  filters: z
    .array(
      z.strictObject({
        kind: z.literal('peaking').meta({ description: 'A peaking filter.' }),
        centerHz: hz('Centre, 0.1 Hz.'),
        gainDb: db('Gain, 0.1 dB; never above maxBoostDb.'),
        q: z.number().meta({ description: 'Q, 0.01.' }),
      }),
    )
    .meta({ description: 'The filters to set on every sub output (one common EQ), rounded as a processor takes them. Never a boost reaching a null. Empty when nothing helps.' }),
  sections: z
    .array(z.strictObject({ b0: coefficient('b0'), b1: coefficient('b1'), b2: coefficient('b2'), a1: coefficient('a1'), a2: coefficient('a2') }))
    .meta({ description: `The same filters as biquads at sampleRateHz, full precision, in the convention ${BIQUAD_CONVENTION}.` }),
  sampleRateHz: hz('The sample rate used.'),
  residual: z
    .strictObject({ before: levels('Without the filters.'), after: levels('With the rounded filters; after.rmsDb ≤ before.rmsDb always.') })
    .meta({ description: `How far the response lies from the target: ${RESIDUAL_DEFINITION}.` }),
  nulls: z
    .array(
      z.strictObject({
        frequencyHz: hz('Where.'),
        depthDb: db('How deep below the level around it.'),
        lowHz: hz('Its lower extent.'),
        highHz: hz('Its upper extent.'),
        reason: z.string().meta({ description: 'Why it is left alone.' }),
      }),
    )
    .meta({ description: 'The deep narrow dips left alone, deepest first.' }),
  frequencyHz: z.array(z.number()).meta({ description: 'The grid.', 'x-unit': 'Hz' }),
  inputDb: dbCurve('The response, relative to the target’s level (0 dB where a flat target sits).'),
  targetDb: dbCurve('The target.'),
  eqDb: dbCurve('The EQ’s own level (the rounded biquads, exact).'),
  correctedDb: dbCurve('The response with the EQ.'),
  levelOffsetDb: db('Where the target sits in the input’s own units (an inline curve’s dB; the model’s dB re 1 Pa per m³/s of volume velocity; a measurement’s dB).'),
  band: z.strictObject({ startHz: hz('The band’s start.'), stopHz: hz('The band’s end.') }).meta({ description: 'The band used.' }),
  target: z
    .discriminatedUnion('kind', [
      z.strictObject({ kind: z.literal('flat').meta({ description: 'A flat target.' }) }),
      z.strictObject({ kind: z.literal('house').meta({ description: 'A house curve.' }), riseDb: db('The rise.'), belowHz: hz('Where it is half done.') }),
    ])
    .meta({ description: 'The target used.' }),
  caution: z.string().meta({ description: 'The safety note on boosts, to show with the filters.' }),
});

const _eqDesign: Same<z.output<typeof eqDesignAnswerSchema>, EqDesignAnswer> = true;
void _eqDesign;
