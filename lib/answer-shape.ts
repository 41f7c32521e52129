import { z } from 'zod';

/**
 * Leaner compute answers: `?fields=` keeps only the named parts of an answer and `?precision=` caps the decimal places
 * of its numbers. Without either the answer is exactly the default one (nothing is walked).
 *
 * The names a route accepts come from its answer schema (lib/openapi/answers): every top-level key, and `key.part` for a
 * key holding an object (that part of it) or a list of objects (that part of each item) — `fields=frequencyHz,sum`,
 * `fields=metrics`, `fields=frequencyHz,paths.magnitudeDb`.
 */

/** Largest `precision`: the default answers never carry more decimal places than this. */
const MAX_PRECISION_DECIMALS = 6;

interface AnswerShapeQuery {
  fields?: string[];
  precision?: number;
}

interface AnswerShape {
  /** The query schema the route parses (and the OpenAPI document shows). */
  query: ReturnType<typeof shapeQuerySchema>;
  /** The names `fields` accepts, in the answer's order. */
  fieldNames: readonly string[];
  /** The answer with only the named parts and numbers rounded to `precision` decimals (the same object when neither is given). */
  apply<T extends object>(answer: T, query: AnswerShapeQuery): Partial<T>;
}

type Def = { type: string; shape?: Record<string, z.ZodType>; element?: z.ZodType; innerType?: z.ZodType; out?: z.ZodType };

/** The object shape inside optional/nullable/pipe wrappers, or null. */
function objectShape(schema: z.ZodType): Record<string, z.ZodType> | null {
  const def = (schema as unknown as { def: Def }).def;
  if (def.type === 'object') return def.shape ?? null;
  if ((def.type === 'optional' || def.type === 'nullable' || def.type === 'default') && def.innerType) return objectShape(def.innerType);
  if (def.type === 'pipe' && def.out) return objectShape(def.out);
  return null;
}

/** The shape of a value's parts: an object's own, or the items' of a list of objects. */
function partShape(schema: z.ZodType): Record<string, z.ZodType> | null {
  const own = objectShape(schema);
  if (own) return own;
  let def = (schema as unknown as { def: Def }).def;
  while ((def.type === 'optional' || def.type === 'nullable') && def.innerType) def = (def.innerType as unknown as { def: Def }).def;
  return def.type === 'array' && def.element ? objectShape(def.element) : null;
}

function fieldNamesOf(answerSchema: z.ZodObject): string[] {
  const names: string[] = [];
  for (const [key, schema] of Object.entries(answerSchema.shape)) {
    names.push(key);
    const parts = partShape(schema as z.ZodType);
    if (parts) for (const part of Object.keys(parts)) names.push(`${key}.${part}`);
  }
  return names;
}

function pickParts(value: unknown, parts: Set<string>): unknown {
  if (Array.isArray(value)) return value.map((item) => pickParts(item, parts));
  if (!value || typeof value !== 'object') return value;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) if (parts.has(k)) out[k] = v;
  return out;
}

function pick(answer: Record<string, unknown>, fields: readonly string[]): Record<string, unknown> {
  const whole = new Set<string>();
  const parts = new Map<string, Set<string>>();
  for (const f of fields) {
    const dot = f.indexOf('.');
    if (dot < 0) whole.add(f);
    else {
      const key = f.slice(0, dot);
      if (!parts.has(key)) parts.set(key, new Set());
      parts.get(key)!.add(f.slice(dot + 1));
    }
  }
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(answer)) {
    if (whole.has(k)) out[k] = v;
    else if (parts.has(k)) out[k] = pickParts(v, parts.get(k)!);
  }
  return out;
}

/** Every number rounded to 1/scale (Math.round: halves upward), −0 as 0; non-finite numbers kept. */
function roundDeep(value: unknown, scale: number): unknown {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) return value;
    const r = Math.round(value * scale) / scale;
    return r === 0 ? 0 : r;
  }
  if (Array.isArray(value)) {
    const out = new Array<unknown>(value.length);
    for (let i = 0; i < value.length; i++) out[i] = roundDeep(value[i], scale);
    return out;
  }
  if (value && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = roundDeep(v, scale);
    return out;
  }
  return value;
}

/** The query schema: `fields` checked against the answer's names, `precision` 0–6. */
function shapeQuerySchema(fieldNames: readonly string[], exactNote: string) {
  const known = new Set(fieldNames);
  return z
    .strictObject({
      fields: z
        .string()
        .max(2000, 'must be at most 2000 characters')
        .transform((text, ctx) => {
          const list = text
            .split(',')
            .map((f) => f.trim())
            .filter((f) => f.length > 0);
          if (list.length === 0) ctx.addIssue({ code: 'custom', message: 'must name at least one part' });
          for (const f of list)
            if (!known.has(f)) ctx.addIssue({ code: 'custom', message: `'${f.slice(0, 60)}' is not a part of this answer (one of: ${fieldNames.join(', ')})` });
          return [...new Set(list)];
        })
        .optional()
        .meta({
          description: `Only these parts of the answer, comma-separated (default: all): a top-level name, or name.part for a part of an object or of each item of a list; the parts left out are absent from the answer (not null). One of: ${fieldNames.join(', ')}.`,
        }),
      precision: z
        .string()
        .regex(/^\d+$/, `must be a whole number of decimal places, 0–${MAX_PRECISION_DECIMALS}`)
        .transform(Number)
        .pipe(z.number().max(MAX_PRECISION_DECIMALS, `must be a whole number of decimal places, 0–${MAX_PRECISION_DECIMALS}`))
        .optional()
        .meta({
          description: `At most this many decimal places in every number of the answer, 0–${MAX_PRECISION_DECIMALS}. Default: each value's own rounding (e.g. 0.001 dB, 0.01°); a larger number than that changes nothing.${exactNote}`,
        }),
    })
    .meta({ description: 'Answer shaping (optional).' });
}

/**
 * The `?fields=&precision=` of one compute route, from its answer schema. `exactKeys`: top-level parts `precision`
 * never rounds (biquad coefficients: rounding them changes the filter a processor would run).
 */
export function answerShape(answerSchema: z.ZodObject, options: { exactKeys?: readonly string[] } = {}): AnswerShape {
  const fieldNames = fieldNamesOf(answerSchema);
  const exact = new Set(options.exactKeys ?? []);
  const exactNote = exact.size ? ` ${[...exact].map((k) => `\`${k}\``).join(', ')} ${exact.size > 1 ? 'are' : 'is'} never rounded (filter coefficients).` : '';
  const query = shapeQuerySchema(fieldNames, exactNote);

  function apply<T extends object>(answer: T, q: AnswerShapeQuery): Partial<T> {
    if (!q.fields && q.precision === undefined) return answer;
    let out = q.fields ? pick(answer as Record<string, unknown>, q.fields) : { ...(answer as Record<string, unknown>) };
    if (q.precision !== undefined) {
      const scale = 10 ** q.precision;
      const rounded: Record<string, unknown> = {};
      for (const [k, v] of Object.entries(out)) rounded[k] = exact.has(k) ? v : roundDeep(v, scale);
      out = rounded;
    }
    return out as Partial<T>;
  }

  return { query, fieldNames, apply };
}
