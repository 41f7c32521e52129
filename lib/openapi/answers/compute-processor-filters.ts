import { z } from 'zod';
import { BIQUAD_CONVENTION } from '@/dsp';
import { COEFFICIENT_SIGN_NOTE, type ProcessorFiltersAnswer } from '@/lib/system-model/processor-filters';

/** The answer of POST /api/v1/processor-filters, tied to the type its handler returns (checked below), strict. */

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

const coefficient = (name: string) => z.number().meta({ description: `${name}, full double precision.` });
const dbCurve = (description: string) => z.array(z.number()).meta({ description, 'x-unit': 'dB' });
const degCurve = (description: string) => z.array(z.number()).meta({ description, 'x-unit': '°' });

export const processorFiltersAnswerSchema = z.strictObject({
  sampleRateHz: z.number().meta({ description: 'Echoed.', 'x-unit': 'Hz' }),
  convention: z.string().meta({ description: `"${BIQUAD_CONVENTION}". ${COEFFICIENT_SIGN_NOTE}` }),
  sections: z
    .array(
      z.strictObject({
        filter: z.number().int().meta({ description: 'Index of the request filter the section belongs to.' }),
        b0: coefficient('b0'),
        b1: coefficient('b1'),
        b2: coefficient('b2'),
        a1: coefficient('a1'),
        a2: coefficient('a2'),
      }),
    )
    .meta({ description: 'Every section in running order. Coefficients at full double precision (never rounded: JSON numbers read back to the same doubles); a0 = 1.' }),
  response: z
    .strictObject({
      frequencyHz: z.array(z.number()).meta({ description: 'The grid, 0.001 Hz.', 'x-unit': 'Hz' }),
      magnitudeDb: dbCurve('Level, 0.001 dB.'),
      phaseDeg: degCurve('Phase, 0.01°, wrapped to (−180, 180].'),
    })
    .meta({ description: 'The cascade of the digital sections, exact (H(e^jω) evaluated, not simulated).' }),
  analog: z.strictObject({ magnitudeDb: dbCurve('Level.'), phaseDeg: degCurve('Phase.') }).meta({ description: 'The analog prototypes on the same grid.' }),
  difference: z
    .strictObject({ magnitudeDb: dbCurve('Level difference, 1e-5 dB.'), phaseDeg: degCurve('Phase difference, 1e-4°.') })
    .meta({ description: 'Digital minus analog at every grid point; large in the stop band near the Nyquist frequency, where the bilinear transform squeezes the response to nothing.' }),
  deviation: z
    .strictObject({
      maxDb: z.number().meta({ description: 'The largest |level difference|, 3 significant digits.', 'x-unit': 'dB' }),
      maxDeg: z.number().meta({ description: 'The largest |phase difference|, 3 significant digits.', 'x-unit': '°' }),
      upToHz: z.number().meta({ description: 'Taken up to min(20 kHz, 0.45·sampleRateHz).', 'x-unit': 'Hz' }),
      floorDb: z.number().meta({ description: 'Only where the analog level is at least this (−40 dB).', 'x-unit': 'dB' }),
    })
    .meta({ description: 'How far the digital filters depart from their analog prototypes.' }),
});

const _processorFilters: Same<z.output<typeof processorFiltersAnswerSchema>, ProcessorFiltersAnswer> = true;
void _processorFilters;
