import { allpassSection, assertEqFilter, shelfQ } from './eq-sections';
import { analogSectionToBiquad } from './bilinear-transform';
import type { AllpassFilter, Biquad, EqFilter } from './filter-types';
import { assertBelowNyquist, assertSampleRate } from './sample-rate';

// The Audio EQ Cookbook's biquads (R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients";
// W3C Audio EQ Cookbook note, 2021), written as the cookbook writes them and then divided by a0:
//   w0 = 2π·f0/fs, α = sin(w0)/(2Q), A = 10^(gainDb/40)
//   peaking    b = [1 + αA, −2cos w0, 1 − αA]                       a = [1 + α/A, −2cos w0, 1 − α/A]
//   low shelf  b = A·[(A+1) − (A−1)cos w0 + 2√Aα, 2((A−1) − (A+1)cos w0), (A+1) − (A−1)cos w0 − 2√Aα]
//              a = [(A+1) + (A−1)cos w0 + 2√Aα, −2((A−1) + (A+1)cos w0), (A+1) + (A−1)cos w0 − 2√Aα]
//   high shelf b = A·[(A+1) + (A−1)cos w0 + 2√Aα, −2((A−1) + (A+1)cos w0), (A+1) + (A−1)cos w0 − 2√Aα]
//              a = [(A+1) − (A−1)cos w0 + 2√Aα, 2((A−1) − (A+1)cos w0), (A+1) − (A−1)cos w0 − 2√Aα]
//   all-pass   b = [1 − α, −2cos w0, 1 + α]                         a = [1 + α, −2cos w0, 1 − α]

function normalised(b0: number, b1: number, b2: number, a0: number, a1: number, a2: number): Biquad {
  return { b0: b0 / a0, b1: b1 / a0, b2: b2 / a0, a1: a1 / a0, a2: a2 / a0 };
}

/**
 * A peaking filter or a shelf as the cookbook's biquad at `sampleRateHz`.
 * @example eqBiquad({ kind: 'peaking', centerHz: 1000, gainDb: 6, q: 1 }, 48000).b1 // −1.8953… (= a1)
 */
export function eqBiquad(filter: EqFilter, sampleRateHz: number, name = 'filter'): Biquad {
  assertSampleRate(sampleRateHz);
  assertEqFilter(filter, name);
  const f0 = filter.kind === 'peaking' ? filter.centerHz : filter.cornerHz;
  assertBelowNyquist(filter.kind === 'peaking' ? `${name}.centerHz` : `${name}.cornerHz`, f0, sampleRateHz);
  const w0 = (2 * Math.PI * f0) / sampleRateHz;
  const cos = Math.cos(w0);
  const a = Math.pow(10, filter.gainDb / 40);
  if (filter.kind === 'peaking') {
    const alpha = Math.sin(w0) / (2 * filter.q);
    return normalised(1 + alpha * a, -2 * cos, 1 - alpha * a, 1 + alpha / a, -2 * cos, 1 - alpha / a);
  }
  const alpha = Math.sin(w0) / (2 * shelfQ(filter, name));
  const k = 2 * Math.sqrt(a) * alpha;
  if (filter.kind === 'low-shelf') {
    return normalised(
      a * (a + 1 - (a - 1) * cos + k),
      2 * a * (a - 1 - (a + 1) * cos),
      a * (a + 1 - (a - 1) * cos - k),
      a + 1 + (a - 1) * cos + k,
      -2 * (a - 1 + (a + 1) * cos),
      a + 1 + (a - 1) * cos - k,
    );
  }
  return normalised(
    a * (a + 1 + (a - 1) * cos + k),
    -2 * a * (a - 1 + (a + 1) * cos),
    a * (a + 1 + (a - 1) * cos - k),
    a + 1 - (a - 1) * cos + k,
    2 * (a - 1 - (a + 1) * cos),
    a + 1 - (a - 1) * cos - k,
  );
}

/**
 * An all-pass as a biquad: second order from the cookbook (phase −180° at cornerHz); first order by the pre-warped
 * bilinear transform of (1 − x)/(1 + x) (phase −90° at cornerHz).
 */
export function allpassBiquad(filter: AllpassFilter, sampleRateHz: number, name = 'filter'): Biquad {
  assertSampleRate(sampleRateHz);
  const section = allpassSection(filter, name);
  assertBelowNyquist(`${name}.cornerHz`, filter.cornerHz, sampleRateHz);
  if (filter.order === 1) return analogSectionToBiquad(section, sampleRateHz, `${name}.cornerHz`);
  const w0 = (2 * Math.PI * filter.cornerHz) / sampleRateHz;
  const alpha = Math.sin(w0) / (2 * section.q);
  const cos = Math.cos(w0);
  return normalised(1 - alpha, -2 * cos, 1 + alpha, 1 + alpha, -2 * cos, 1 - alpha);
}
