import { z } from 'zod';

/** A JSON Schema (draft 2020-12) node as the document holds it. */
export type JsonSchema = { [keyword: string]: unknown };

/** Where shared schemas live in the document; every `$ref` points here. */
const COMPONENT_PREFIX = '#/components/schemas/';
const DEFS_PREFIX = '#/$defs/';

/**
 * Zod schemas → JSON Schema with zod 4's own `z.toJSONSchema`, all in two conversions (requests as the client sends
 * them, `io: 'input'`; answers as the app sends them, `io: 'output'`).
 *
 * Shared schemas are marked where they are defined with `.meta({ id: 'PascalName' })` (zod's global registry; ids
 * unique across the API). Each becomes one entry of `components.schemas` and every use a `$ref` to it. When the input
 * and the output form of one id differ (defaults make fields optional on input only), the output form is named
 * `<id>Output`. Everything else is written inline where it is used.
 */
export interface ConvertedSchemas {
  /** The JSON Schema of each entry, by the key it was given. */
  byKey: Map<string, JsonSchema>;
  /** components.schemas. */
  components: Record<string, JsonSchema>;
}

type Io = 'input' | 'output';

function convertAll(entries: readonly (readonly [string, z.ZodType])[], io: Io): { properties: Record<string, JsonSchema>; defs: Record<string, JsonSchema> } {
  const wrapper = z.object(Object.fromEntries(entries));
  const json = z.toJSONSchema(wrapper, {
    target: 'draft-2020-12',
    io,
    unrepresentable: 'any',
    // `.readonly()` makes a TypeScript type immutable; it is not OpenAPI's readOnly ("sent in answers only").
    override: ({ zodSchema, jsonSchema }) => {
      if (zodSchema._zod.def.type === 'readonly') delete jsonSchema.readOnly;
    },
  }) as JsonSchema;
  return { properties: (json.properties ?? {}) as Record<string, JsonSchema>, defs: (json.$defs ?? {}) as Record<string, JsonSchema> };
}

/** Every `$ref` target named in a schema (ids of $defs). */
function refsIn(node: unknown, into = new Set<string>()): Set<string> {
  if (Array.isArray(node)) for (const item of node) refsIn(item, into);
  else if (node && typeof node === 'object') {
    for (const [key, value] of Object.entries(node)) {
      if (key === '$ref' && typeof value === 'string' && value.startsWith(DEFS_PREFIX)) into.add(value.slice(DEFS_PREFIX.length));
      else refsIn(value, into);
    }
  }
  return into;
}

/** A deep copy with every `#/$defs/<id>` turned into `#/components/schemas/<name(id)>`. */
function relink(node: unknown, name: (id: string) => string): unknown {
  if (Array.isArray(node)) return node.map((item) => relink(item, name));
  if (!node || typeof node !== 'object') return node;
  const out: JsonSchema = {};
  for (const [key, value] of Object.entries(node)) {
    out[key] = key === '$ref' && typeof value === 'string' && value.startsWith(DEFS_PREFIX) ? COMPONENT_PREFIX + name(value.slice(DEFS_PREFIX.length)) : relink(value, name);
  }
  return out;
}

/** Ids of the output defs that must be named apart: those that differ from the input form, and those that refer to one. */
function outputOnlyIds(inputDefs: Record<string, JsonSchema>, outputDefs: Record<string, JsonSchema>): Set<string> {
  const apart = new Set<string>();
  for (const [id, def] of Object.entries(outputDefs)) {
    const twin = inputDefs[id];
    if (twin && JSON.stringify(twin) !== JSON.stringify(def)) apart.add(id);
  }
  for (let grew = true; grew; ) {
    grew = false;
    for (const [id, def] of Object.entries(outputDefs)) {
      if (apart.has(id) || !inputDefs[id]) continue;
      if ([...refsIn(def)].some((r) => apart.has(r))) {
        apart.add(id);
        grew = true;
      }
    }
  }
  return apart;
}

/**
 * Converts request schemas (`io: 'input'`) and answer schemas (`io: 'output'`), each under a key of the caller's
 * choosing, into JSON Schemas that refer to one shared `components.schemas`.
 */
export function convertSchemas(requests: readonly (readonly [string, z.ZodType])[], answers: readonly (readonly [string, z.ZodType])[]): ConvertedSchemas {
  const input = convertAll(requests, 'input');
  const output = convertAll(answers, 'output');
  const apart = outputOnlyIds(input.defs, output.defs);
  // zod names a def without an id `__schemaN` (a cycle); the two conversions count separately.
  const inputName = (id: string) => (id.startsWith('__schema') ? `Input${id.slice(2)}` : id);
  const outputName = (id: string) => (id.startsWith('__schema') ? `Output${id.slice(2)}` : apart.has(id) ? `${id}Output` : id);
  const components: Record<string, JsonSchema> = {};
  for (const [id, def] of Object.entries(input.defs)) components[inputName(id)] = relink(def, inputName) as JsonSchema;
  for (const [id, def] of Object.entries(output.defs)) components[outputName(id)] ??= relink(def, outputName) as JsonSchema;
  const byKey = new Map<string, JsonSchema>();
  for (const [key, schema] of Object.entries(input.properties)) byKey.set(key, relink(schema, inputName) as JsonSchema);
  for (const [key, schema] of Object.entries(output.properties)) byKey.set(key, relink(schema, outputName) as JsonSchema);
  const sorted = Object.fromEntries(Object.entries(components).sort(([a], [b]) => a.localeCompare(b)));
  return { byKey, components: sorted };
}
