import { filterSections, rolloffSections } from '../filters/analog-sections';
import { eqSection } from '../filters/eq-sections';
import type { AnalogSection, EqFilter } from '../filters/filter-types';
import { assertFinite, assertNonNegative } from '../internal/guards';
import { compileSections, type SectionPlan } from '../internal/section-plan';
import type { PathSpec } from './blend-types';
import { measuredFactor } from './measured-factor';

/** A validated path ready for evaluation. */
export interface CompiledPath {
  readonly name: string;
  readonly plan: SectionPlan;
  /** Total delay: delayMs plus the air path, seconds. */
  readonly delayS: number;
}

/** Most EQ filters one path may run: a profile's voicing (4 switches × 4 filters) and a processor output's 10. */
export const MAX_PATH_EQ_FILTERS = 26;

/** The analog sections of a path's EQ (cookbook prototypes, at most MAX_PATH_EQ_FILTERS); errors name `eq[i].field`. */
function pathEqSections(eq: readonly EqFilter[] | undefined): AnalogSection[] {
  if (eq === undefined) return [];
  if (!Array.isArray(eq)) throw new RangeError('eq must be a list of filters');
  if (eq.length > MAX_PATH_EQ_FILTERS) throw new RangeError(`eq must hold at most ${MAX_PATH_EQ_FILTERS} filters (got ${eq.length})`);
  return eq.map((f, i) => eqSection(f, `eq[${i}]`));
}

/** Validates a path and packs its sections (filter, roll-offs, EQ); `prefix` names the parameter in error messages (`path.eq[1].q`). */
export function compilePath(path: PathSpec, speedMps: number, prefix = 'path'): CompiledPath {
  if (path === null || typeof path !== 'object') throw new RangeError(`${prefix} must be an object`);
  if (path.filter === null || typeof path.filter !== 'object') throw new RangeError(`${prefix}.filter must be an object`);
  assertFinite(`${prefix}.gainDb`, path.gainDb);
  assertNonNegative(`${prefix}.delayMs`, path.delayMs);
  if (path.distanceM !== undefined) assertNonNegative(`${prefix}.distanceM`, path.distanceM);
  if (typeof path.invert !== 'boolean') throw new RangeError(`${prefix}.invert must be a boolean`);
  let sections;
  try {
    // The EQ after the filter and roll-off sections; an absent or empty EQ adds no section (the plan stays as fast).
    sections = [...filterSections(path.filter), ...rolloffSections(path.rolloff), ...pathEqSections(path.eq)];
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`${prefix}.${error.message}`);
    throw error;
  }
  const gain = Math.pow(10, path.gainDb / 20) * (path.invert ? -1 : 1);
  const delayS = path.delayMs / 1000 + (path.distanceM ?? 0) / speedMps;
  const measured = path.measured === undefined ? null : measuredFactor(path.measured, `${prefix}.measured`);
  return { name: String(path.name), plan: compileSections(sections, gain, measured), delayS };
}
