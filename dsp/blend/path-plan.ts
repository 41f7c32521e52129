import { filterSections, rolloffSections } from '../filters/analog-sections';
import { assertFinite, assertNonNegative } from '../internal/guards';
import { compileSections, type SectionPlan } from '../internal/section-plan';
import type { PathSpec } from './blend-types';

/** A validated path ready for evaluation. */
export interface CompiledPath {
  readonly name: string;
  readonly plan: SectionPlan;
  /** Total delay: delayMs plus the air path, seconds. */
  readonly delayS: number;
}

/** Validates a path and packs its sections; `prefix` names the parameter in error messages. */
export function compilePath(path: PathSpec, speedMps: number, prefix = 'path'): CompiledPath {
  if (path === null || typeof path !== 'object') throw new RangeError(`${prefix} must be an object`);
  if (path.filter === null || typeof path.filter !== 'object') throw new RangeError(`${prefix}.filter must be an object`);
  assertFinite(`${prefix}.gainDb`, path.gainDb);
  assertNonNegative(`${prefix}.delayMs`, path.delayMs);
  if (path.distanceM !== undefined) assertNonNegative(`${prefix}.distanceM`, path.distanceM);
  if (typeof path.invert !== 'boolean') throw new RangeError(`${prefix}.invert must be a boolean`);
  let sections;
  try {
    sections = [...filterSections(path.filter), ...rolloffSections(path.rolloff)];
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`${prefix}.${error.message}`);
    throw error;
  }
  const gain = Math.pow(10, path.gainDb / 20) * (path.invert ? -1 : 1);
  const delayS = path.delayMs / 1000 + (path.distanceM ?? 0) / speedMps;
  return { name: String(path.name), plan: compileSections(sections, gain), delayS };
}
