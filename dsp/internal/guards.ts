// Invariant guards shared by every dsp function. Each throws a RangeError naming the parameter.

/** Throws unless `value` is a finite number. */
export function assertFinite(name: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number (got ${String(value)})`);
  }
}

/** Throws unless `value` is finite and > 0. */
export function assertPositive(name: string, value: number): void {
  assertFinite(name, value);
  if (value <= 0) throw new RangeError(`${name} must be greater than 0 (got ${value})`);
}

/** Throws unless `value` is finite and ≥ 0. */
export function assertNonNegative(name: string, value: number): void {
  assertFinite(name, value);
  if (value < 0) throw new RangeError(`${name} must not be negative (got ${value})`);
}

/** Throws unless `value` is an integer in [min, max]. */
export function assertIntegerInRange(name: string, value: number, min: number, max: number): void {
  assertFinite(name, value);
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${name} must be an integer from ${min} to ${max} (got ${value})`);
  }
}

/** Throws unless `value` is finite and within [min, max]. */
export function assertInRange(name: string, value: number, min: number, max: number): void {
  assertFinite(name, value);
  if (value < min || value > max) {
    throw new RangeError(`${name} must be from ${min} to ${max} (got ${value})`);
  }
}

/** Air temperature guard: finite and above absolute zero (the speed-of-sound formula needs T > −273.15 °C). */
export function assertTemperature(name: string, value: number): void {
  assertFinite(name, value);
  if (value <= -273.15) throw new RangeError(`${name} must be above -273.15 °C (got ${value})`);
}

/** Throws unless every entry is finite and > 0, and returns the values as a Float64Array (copied when needed). */
export function positiveFrequencies(name: string, values: ArrayLike<number>): Float64Array {
  if (values.length === 0) throw new RangeError(`${name} must contain at least one frequency`);
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    if (!Number.isFinite(v) || v <= 0) {
      throw new RangeError(`${name}[${i}] must be a finite frequency greater than 0 (got ${String(v)})`);
    }
  }
  return values instanceof Float64Array ? values : Float64Array.from(values);
}

/** Throws unless every entry is finite. */
export function assertFiniteArray(name: string, values: ArrayLike<number>): void {
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    if (!Number.isFinite(v)) throw new RangeError(`${name}[${i}] must be a finite number (got ${String(v)})`);
  }
}

/** Throws unless `values` is sorted strictly ascending. */
export function assertAscending(name: string, values: ArrayLike<number>): void {
  for (let i = 1; i < values.length; i++) {
    if (!((values[i] as number) > (values[i - 1] as number))) {
      throw new RangeError(`${name} must be strictly ascending (index ${i})`);
    }
  }
}

/** Throws unless two arrays have the same length. */
export function assertSameLength(name: string, values: ArrayLike<number>, expected: number): void {
  if (values.length !== expected) {
    throw new RangeError(`${name} must have ${expected} entries like frequencyHz (got ${values.length})`);
  }
}

/**
 * Validates a curve given point by point: frequencyHz finite, > 0 and strictly ascending, magnitudeDb one finite value
 * per frequency. Returns the frequencies as a Float64Array (copied when needed).
 */
export function curveFrequencies(frequencyHz: ArrayLike<number>, magnitudeDb: ArrayLike<number>): Float64Array {
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  assertAscending('frequencyHz', f);
  assertSameLength('magnitudeDb', magnitudeDb, f.length);
  assertFiniteArray('magnitudeDb', magnitudeDb);
  return f;
}
