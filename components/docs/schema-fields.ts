import type { JsonSchema } from '@/lib/openapi/json-schema';

/** One row of a field table on the API page, read from a JSON Schema. */
export interface FieldRow {
  /** Dotted, with `[]` for array items: `paths[].filter.cornerHz`. */
  name: string;
  type: string;
  /** Shared schemas the type names, linked to their own section. */
  links: string[];
  unit?: string;
  required: boolean;
  description?: string;
  defaultValue?: string;
}

type Components = Record<string, JsonSchema>;

/** A shared schema with more rows than this (or a union) gets its own section and a link instead of being written out. */
const MAX_INLINE_ROWS = 16;
const MAX_DEPTH = 8;
const REF_PREFIX = '#/components/schemas/';

const refName = (node: JsonSchema): string | null => (typeof node.$ref === 'string' && node.$ref.startsWith(REF_PREFIX) ? node.$ref.slice(REF_PREFIX.length) : null);
const asSchema = (v: unknown): JsonSchema => (v && typeof v === 'object' && !Array.isArray(v) ? (v as JsonSchema) : {});
const variantsOf = (node: JsonSchema): JsonSchema[] | null => {
  const list = node.anyOf ?? node.oneOf;
  return Array.isArray(list) ? list.map(asSchema) : null;
};
const isNull = (node: JsonSchema) => node.type === 'null';
const child = (name: string, key: string) => (name ? `${name}.${key}` : key);
const literal = (v: unknown) => (typeof v === 'string' ? `'${v}'` : JSON.stringify(v));

/** `anyOf: [X, { type: 'null' }]` and `type: [T, 'null']` (zod's nullable) as X and "may be null". */
function withoutNull(node: JsonSchema): { node: JsonSchema; nullable: boolean } {
  if (Array.isArray(node.type) && node.type.includes('null')) {
    const types = node.type.filter((t) => t !== 'null');
    return { node: { ...node, type: types.length === 1 ? types[0] : types }, nullable: true };
  }
  const variants = variantsOf(node);
  if (!variants || !variants.some(isNull)) return { node, nullable: false };
  const rest = variants.filter((v) => !isNull(v));
  const { anyOf: _a, oneOf: _o, ...own } = node;
  void _a;
  void _o;
  return { node: rest.length === 1 ? { ...rest[0], ...own } : { ...own, anyOf: rest }, nullable: true };
}

/** The words of a type: `number`, `'a' | 'b'`, `FilterShape[]`, `[number, number]`. */
function typeWords(node: JsonSchema, links: string[]): string {
  const name = refName(node);
  if (name) {
    links.push(name);
    return name;
  }
  if (node.const !== undefined) return literal(node.const);
  if (Array.isArray(node.enum)) return node.enum.map(literal).join(' | ');
  const variants = variantsOf(node);
  if (variants) return variants.map((v) => typeWords(v, links)).join(' | ');
  if (Array.isArray(node.prefixItems)) return `[${node.prefixItems.map((v) => typeWords(asSchema(v), links)).join(', ')}]`;
  if (node.type === 'array') {
    const items = typeWords(asSchema(node.items), links);
    return items.includes(' ') ? `(${items})[]` : `${items}[]`;
  }
  if (Array.isArray(node.type)) return node.type.join(' | ');
  if (node.type === 'string' && typeof node.format === 'string') return `string (${node.format})`;
  if (typeof node.type === 'string') return node.type === 'object' && !node.properties ? 'object (any keys)' : node.type;
  return 'any';
}

/** The variant's label from a property every variant fixes (`kind 'sealed'`), else its number. */
function variantLabel(variants: JsonSchema[], i: number): string {
  const fixed = (v: JsonSchema | undefined, key: string) => asSchema(asSchema(v?.properties)[key]).const;
  const key = Object.keys(asSchema(variants[0]?.properties)).find((k) => variants.every((v) => fixed(v, k) !== undefined));
  return key ? `${key} ${literal(fixed(variants[i], key))}` : `form ${i + 1}`;
}

/** Shared schemas being measured right now (a schema that contains itself is linked, never written out). */
const measuring = new Set<string>();
/** The answers of `writtenOut`, per document. */
const decided = new WeakMap<Components, Map<string, boolean>>();

/** Whether a shared schema is written out where it is used (small objects) or linked to its own section. */
function writtenOut(name: string, components: Components): boolean {
  let known = decided.get(components);
  if (!known) decided.set(components, (known = new Map()));
  const cached = known.get(name);
  if (cached !== undefined) return cached;
  const target = components[name];
  if (!target || variantsOf(target) || target.type !== 'object' || measuring.has(name)) return false;
  measuring.add(name);
  try {
    const small = fieldRows(target, components).length <= MAX_INLINE_ROWS;
    known.set(name, small);
    return small;
  } finally {
    measuring.delete(name);
  }
}

interface Walk {
  components: Components;
  rows: FieldRow[];
}

/** The object a node stands for when its fields are written out here (itself, or a small shared schema); else null. */
function objectToWriteOut(w: Walk, node: JsonSchema): JsonSchema | null {
  const ref = refName(node);
  if (ref) return writtenOut(ref, w.components) ? (w.components[ref] ?? null) : null;
  return node.type === 'object' && node.properties ? node : null;
}

/** The fields under a node: an object's properties, each form of a union of objects, an array's items. */
function walkInside(w: Walk, node: JsonSchema, name: string, depth: number, note: string): void {
  if (depth >= MAX_DEPTH) return;
  const object = objectToWriteOut(w, node);
  if (object) return walkProperties(w, object, name, depth, note);
  if (refName(node)) return;
  const variants = variantsOf(node);
  const forms = variants?.map((v) => objectToWriteOut(w, v));
  if (variants && forms && forms.every((f): f is JsonSchema => f !== null)) {
    forms.forEach((f, i) => walkProperties(w, f, name, depth, `${note}(${refName(variants[i] ?? {}) ?? variantLabel(forms, i)}) `));
  } else if (node.type === 'array' && !Array.isArray(node.prefixItems)) {
    walkInside(w, withoutNull(asSchema(node.items)).node, `${name}[]`, depth + 1, note);
  }
}

function walk(w: Walk, raw: JsonSchema, name: string, required: boolean, depth: number, note: string): void {
  const { node, nullable } = withoutNull(raw);
  const ref = refName(node);
  const shared = ref ? w.components[ref] : undefined;
  const links: string[] = [];
  // A small shared schema is written out where it is used: its type reads 'object', its fields follow.
  const inline = ref !== null && writtenOut(ref, w.components);
  const type = (inline ? 'object' : typeWords(node, links)) + (nullable ? ' | null' : '');
  const description = typeof node.description === 'string' ? node.description : (shared?.description as string | undefined);
  const unit = node['x-unit'] ?? shared?.['x-unit'];
  const defaultValue = node.default ?? shared?.default;
  w.rows.push({
    name,
    type,
    links: inline ? [] : links,
    required,
    ...(typeof unit === 'string' ? { unit } : {}),
    ...(description || note ? { description: `${note}${description ?? ''}` } : {}),
    ...(defaultValue !== undefined ? { defaultValue: JSON.stringify(defaultValue) } : {}),
  });
  walkInside(w, node, name, depth, note);
}

function walkProperties(w: Walk, node: JsonSchema, name: string, depth: number, note: string): void {
  const required = new Set(Array.isArray(node.required) ? (node.required as string[]) : []);
  for (const [key, value] of Object.entries(asSchema(node.properties))) walk(w, asSchema(value), child(name, key), required.has(key), depth + 1, note);
}

/** The field table of a schema (a request body, an answer, a shared schema): one row per field, nested fields dotted. */
export function fieldRows(schema: JsonSchema, components: Components): FieldRow[] {
  const w: Walk = { components, rows: [] };
  const ref = refName(schema);
  // The root of a table is always written out (a request body or answer that is itself a shared schema).
  const root = withoutNull(ref ? (components[ref] ?? {}) : schema).node;
  const before = w.rows.length;
  walkInside(w, root, '', 0, '');
  if (w.rows.length === before) walk(w, root, '(body)', true, 0, '');
  return w.rows;
}

/** The shared schemas the tables link to, and those their own tables link to, in order of first mention. */
export function linkedSchemas(tables: readonly (readonly FieldRow[])[], components: Components): string[] {
  const found: string[] = [];
  const add = (rows: readonly FieldRow[]) => {
    for (const name of rows.flatMap((r) => r.links)) {
      if (found.includes(name) || !components[name]) continue;
      found.push(name);
      add(fieldRows({ $ref: `${REF_PREFIX}${name}` }, components));
    }
  };
  tables.forEach(add);
  return found;
}
