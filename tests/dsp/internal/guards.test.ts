import { describe, expect, it } from 'vitest';
import {
  assertAscending,
  assertFinite,
  assertFiniteArray,
  assertIntegerInRange,
  assertInRange,
  assertNonNegative,
  assertPositive,
  assertSameLength,
  assertTemperature,
  curveFrequencies,
  positiveFrequencies,
} from '@/dsp/internal/guards';

// Each guard's contract is its doc comment: the values it lets through, and a RangeError naming the parameter otherwise.
describe('dsp guards', () => {
  it('assertFinite lets finite numbers through and refuses NaN, ±Infinity and non-numbers, naming the parameter', () => {
    for (const ok of [0, -1e300, 5e-324, 42]) expect(() => assertFinite('x', ok)).not.toThrow();
    for (const bad of [NaN, Infinity, -Infinity, '1' as unknown as number, undefined as unknown as number]) {
      expect(() => assertFinite('gainDb', bad)).toThrow(RangeError);
      expect(() => assertFinite('gainDb', bad)).toThrow(/^gainDb must be a finite number/);
    }
  });
  it('assertPositive refuses 0 and below; assertNonNegative lets 0 through and refuses below', () => {
    expect(() => assertPositive('cornerHz', 1e-9)).not.toThrow();
    expect(() => assertPositive('cornerHz', 0)).toThrow(/^cornerHz must be greater than 0 \(got 0\)/);
    expect(() => assertPositive('cornerHz', -2)).toThrow(RangeError);
    expect(() => assertPositive('cornerHz', NaN)).toThrow(/cornerHz/);
    expect(() => assertNonNegative('delayMs', 0)).not.toThrow();
    expect(() => assertNonNegative('delayMs', -1e-12)).toThrow(/^delayMs must not be negative/);
    expect(() => assertNonNegative('delayMs', Infinity)).toThrow(RangeError);
  });
  it('assertIntegerInRange takes integers at both ends and refuses fractions and values outside', () => {
    for (const ok of [1, 4, 8]) expect(() => assertIntegerInRange('order', ok, 1, 8)).not.toThrow();
    for (const bad of [0, 9, 2.5, NaN]) expect(() => assertIntegerInRange('order', bad, 1, 8)).toThrow(/^order must/);
    expect(() => assertIntegerInRange('order', 9, 1, 8)).toThrow('order must be an integer from 1 to 8 (got 9)');
  });
  it('assertInRange takes both ends and refuses values outside', () => {
    for (const ok of [10, 80, 24000]) expect(() => assertInRange('crossoverHz', ok, 10, 24000)).not.toThrow();
    for (const bad of [9.999, 24000.1, NaN]) expect(() => assertInRange('crossoverHz', bad, 10, 24000)).toThrow(/^crossoverHz must/);
  });
  it('assertTemperature refuses absolute zero and below (c = 331.3·√(1 + T/273.15) needs T > −273.15 °C; published: Kinsler et al. 2000)', () => {
    expect(() => assertTemperature('temperatureC', -273.14)).not.toThrow();
    expect(() => assertTemperature('temperatureC', -273.15)).toThrow(/^temperatureC must be above -273.15/);
    expect(() => assertTemperature('temperatureC', NaN)).toThrow(RangeError);
  });
  it('positiveFrequencies refuses an empty list and names the first bad entry; copies arrays, keeps a Float64Array', () => {
    expect(() => positiveFrequencies('frequencyHz', [])).toThrow(/^frequencyHz must contain at least one frequency/);
    expect(() => positiveFrequencies('frequencyHz', [20, 0, -1])).toThrow(/^frequencyHz\[1\] must be a finite frequency greater than 0/);
    expect(() => positiveFrequencies('frequencyHz', [20, Infinity])).toThrow(/frequencyHz\[1\]/);
    const plain = [20, 40];
    const copied = positiveFrequencies('frequencyHz', plain);
    expect(copied).toBeInstanceOf(Float64Array);
    expect(Array.from(copied)).toEqual([20, 40]);
    const typed = new Float64Array([10, 20]);
    expect(positiveFrequencies('frequencyHz', typed)).toBe(typed);
  });
  it('assertFiniteArray, assertAscending and assertSameLength name the index or the expected length', () => {
    expect(() => assertFiniteArray('magnitudeDb', [0, -3, 1e9])).not.toThrow();
    expect(() => assertFiniteArray('magnitudeDb', [0, NaN])).toThrow(/^magnitudeDb\[1\] must be a finite number/);
    expect(() => assertAscending('frequencyHz', [10, 20, 30])).not.toThrow();
    expect(() => assertAscending('frequencyHz', [10, 20, 20])).toThrow('frequencyHz must be strictly ascending (index 2)');
    expect(() => assertAscending('frequencyHz', [10, NaN])).toThrow(/index 1/);
    expect(() => assertSameLength('phaseDeg', [1, 2], 2)).not.toThrow();
    expect(() => assertSameLength('phaseDeg', [1, 2], 3)).toThrow('phaseDeg must have 3 entries like frequencyHz (got 2)');
  });
  it('curveFrequencies checks a curve in order (frequencies positive, ascending; one finite level each) and returns the frequencies', () => {
    const f = curveFrequencies([20, 40, 80], [0, -3, -12]);
    expect(f).toBeInstanceOf(Float64Array);
    expect(Array.from(f)).toEqual([20, 40, 80]);
    expect(() => curveFrequencies([20, 0], [0, NaN])).toThrow(/^frequencyHz\[1\] must be a finite frequency greater than 0/);
    expect(() => curveFrequencies([40, 20], [0])).toThrow('frequencyHz must be strictly ascending (index 1)');
    expect(() => curveFrequencies([20, 40], [0])).toThrow('magnitudeDb must have 2 entries like frequencyHz (got 1)');
    expect(() => curveFrequencies([20, 40], [0, Infinity])).toThrow(/^magnitudeDb\[1\] must be a finite number/);
  });
});
