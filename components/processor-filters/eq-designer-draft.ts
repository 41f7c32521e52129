import { EQ_DESIGN_DEFAULTS, EQ_DESIGN_LIMITS, EQ_LIMITS, MAX_HOUSE_RISE_DB } from '@/dsp';
import { formatNumberText, parseNumberText, type DecimalMark } from '@/lib/number-input';
import type { EqDesignDocumentOptions } from '@/lib/system-model/eq-design';

/**
 * The EQ designer's form as typed: numbers kept as text (so a half-typed or wrong value stays on screen with its
 * message), read once into the designer's options by `readEqDesignerDraft`. Nothing runs while a field is wrong.
 */

/** Where the curve the designer works on comes from: the room model, or stored measurements at the seats. */
export type EqDesignSource = 'model' | 'measured';

export interface EqDesignerDraft {
  source: EqDesignSource;
  /** The main listening position, or the power average over every seat. */
  at: 'mlp' | 'average';
  target: 'flat' | 'house';
  riseDb: string;
  belowHz: string;
  startHz: string;
  stopHz: string;
  maxFilters: string;
  maxBoostDb: string;
  maxCutDb: string;
  qMin: string;
  qMax: string;
  /** Run the model with the EQ the subs run now (a check of it; such a run is not applied). */
  withPresentEq: boolean;
}

export type EqDesignerField = 'riseDb' | 'belowHz' | 'startHz' | 'stopHz' | 'maxFilters' | 'maxBoostDb' | 'maxCutDb' | 'qMin' | 'qMax';

/**
 * The band's room on the designer's grid: the Modes tab's 15–200 Hz, the grid eqDesignRequestFromDocument and the
 * measured request use (lib/validations/compute-eq-design.ts), inside which the band must lie.
 */
const GRID_HZ = { min: 15, max: 200 } as const;

/** Each number field: its label, unit, limits (the API's, from dsp) and whether it takes whole numbers only. */
export const EQ_DESIGNER_FIELDS: Record<EqDesignerField, { label: string; unit?: string; min: number; max: number; integer?: boolean }> = {
  riseDb: { label: 'Rise', unit: 'dB', min: 0, max: MAX_HOUSE_RISE_DB },
  belowHz: { label: 'Below', unit: 'Hz', min: 20, max: 200 },
  startHz: { label: 'Band from', unit: 'Hz', min: GRID_HZ.min, max: GRID_HZ.max },
  stopHz: { label: 'Band to', unit: 'Hz', min: GRID_HZ.min, max: GRID_HZ.max },
  maxFilters: { label: 'Filters, at most', min: 1, max: EQ_DESIGN_LIMITS.maxFilters, integer: true },
  maxBoostDb: { label: 'Largest boost', unit: 'dB', min: 0, max: EQ_DESIGN_LIMITS.maxBoostDb },
  maxCutDb: { label: 'Deepest cut', unit: 'dB', min: 0, max: EQ_DESIGN_LIMITS.maxCutDb },
  qMin: { label: 'Q from', min: EQ_LIMITS.q.min, max: EQ_LIMITS.q.max },
  qMax: { label: 'Q to', min: EQ_LIMITS.q.min, max: EQ_LIMITS.q.max },
};

/** A house curve to start from when the target is switched to one: +6 dB below 60 Hz (a common choice, from memory). */
const HOUSE_START = { riseDb: 6, belowHz: 60 } as const;

/** The designer's defaults (dsp's EQ_DESIGN_DEFAULTS: 5 filters on 20–120 Hz, boosts to +3 dB), at the MLP, on the model. */
export function defaultEqDesignerDraft(decimalMark: DecimalMark = '.'): EqDesignerDraft {
  const d = EQ_DESIGN_DEFAULTS;
  const t = (x: number) => formatNumberText(x, 2, decimalMark);
  return {
    source: 'model',
    at: 'mlp',
    target: 'flat',
    riseDb: t(HOUSE_START.riseDb),
    belowHz: t(HOUSE_START.belowHz),
    startHz: t(d.band.startHz),
    stopHz: t(d.band.stopHz),
    maxFilters: t(d.maxFilters),
    maxBoostDb: t(d.maxBoostDb),
    maxCutDb: t(d.maxCutDb),
    qMin: t(d.q.min),
    qMax: t(d.q.max),
    withPresentEq: false,
  };
}

/** The options the draft stands for, ready for eqDesignRequestFromDocument (and, without withPresentEq, the measured request). */
export type EqDesignerOptions = Required<Pick<EqDesignDocumentOptions, 'at' | 'withPresentEq' | 'target' | 'band' | 'maxFilters' | 'maxBoostDb' | 'maxCutDb' | 'q'>>;

export type EqDesignerReading = { ok: true; options: EqDesignerOptions } | { ok: false; errors: Partial<Record<EqDesignerField, string>> };

/**
 * The draft read into options, or a message for every wrong field ("Band to must be above Band from (20 Hz)"): text
 * read by lib/number-input (either decimal mark, the field's unit may follow), each number within the API's limits.
 * The house curve's fields are read only when the target is a house curve.
 * @example readEqDesignerDraft({ ...defaultEqDesignerDraft(), maxFilters: '12' }, '.') // { ok: false, errors: { maxFilters: 'Filters, at most must be at most 10' } }
 */
export function readEqDesignerDraft(draft: EqDesignerDraft, decimalMark: DecimalMark): EqDesignerReading {
  const errors: Partial<Record<EqDesignerField, string>> = {};
  const values: Partial<Record<EqDesignerField, number>> = {};
  const fields = (Object.keys(EQ_DESIGNER_FIELDS) as EqDesignerField[]).filter((f) => draft.target === 'house' || (f !== 'riseDb' && f !== 'belowHz'));
  for (const field of fields) {
    const spec = EQ_DESIGNER_FIELDS[field];
    const unit = spec.unit ? ` ${spec.unit}` : '';
    const r = parseNumberText(draft[field], { decimalMark, ...(spec.unit ? { unit: spec.unit } : {}) });
    if (!r.ok) errors[field] = `${spec.label}: ${r.message}`;
    else if (r.value < spec.min) errors[field] = `${spec.label} must be at least ${spec.min}${unit}`;
    else if (r.value > spec.max) errors[field] = `${spec.label} must be at most ${spec.max}${unit}`;
    else if (spec.integer && !Number.isInteger(r.value)) errors[field] = `${spec.label} must be a whole number`;
    else values[field] = r.value;
  }
  const { startHz, stopHz, qMin, qMax } = values;
  if (startHz !== undefined && stopHz !== undefined && !(stopHz > startHz)) errors.stopHz = `${EQ_DESIGNER_FIELDS.stopHz.label} must be above ${EQ_DESIGNER_FIELDS.startHz.label} (${startHz} Hz)`;
  if (qMin !== undefined && qMax !== undefined && qMax < qMin) errors.qMax = `${EQ_DESIGNER_FIELDS.qMax.label} must be at least ${EQ_DESIGNER_FIELDS.qMin.label} (${qMin})`;
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const v = values as Record<EqDesignerField, number>;
  return {
    ok: true,
    options: {
      at: draft.at,
      withPresentEq: draft.source === 'model' && draft.withPresentEq,
      target: draft.target === 'house' ? { kind: 'house', riseDb: v.riseDb, belowHz: v.belowHz } : { kind: 'flat' },
      band: { startHz: v.startHz, stopHz: v.stopHz },
      maxFilters: v.maxFilters,
      maxBoostDb: v.maxBoostDb,
      maxCutDb: v.maxCutDb,
      q: { min: v.qMin, max: v.qMax },
    },
  };
}
