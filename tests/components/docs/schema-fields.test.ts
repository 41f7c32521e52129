import { describe, expect, it } from 'vitest';
import { fieldRows, linkedSchemas } from '@/components/docs/schema-fields';
import type { JsonSchema } from '@/lib/openapi/json-schema';

/** The API page's field tables, read from hand-written JSON Schemas (the expected rows are worked out by hand). */
const components: Record<string, JsonSchema> = {
  Corner: { type: 'object', description: 'A corner.', properties: { cornerHz: { type: 'number', 'x-unit': 'Hz', description: 'Where.' } }, required: ['cornerHz'] },
  Shape: {
    description: 'One of two.',
    oneOf: [
      { type: 'object', properties: { kind: { type: 'string', const: 'none' } }, required: ['kind'] },
      { type: 'object', properties: { kind: { type: 'string', const: 'sealed' }, q: { type: 'number', description: 'Q.' } }, required: ['kind', 'q'] },
    ],
  },
};

const names = (rows: ReturnType<typeof fieldRows>) => rows.map((r) => r.name);

describe('fieldRows(schema, components)', () => {
  it('dots nested fields, marks array items with [] and says what is required, with unit and default', () => {
    const rows = fieldRows(
      {
        type: 'object',
        properties: {
          grid: { type: 'object', properties: { startHz: { type: 'number', 'x-unit': 'Hz', description: 'First.' } }, required: ['startHz'] },
          paths: { type: 'array', items: { type: 'object', properties: { gainDb: { type: 'number', default: 0, 'x-unit': 'dB' } } } },
        },
        required: ['grid'],
      },
      components,
    );
    expect(names(rows)).toEqual(['grid', 'grid.startHz', 'paths', 'paths[].gainDb']);
    expect(rows[1]).toMatchObject({ type: 'number', unit: 'Hz', required: true, description: 'First.' });
    expect(rows[2]).toMatchObject({ type: 'object[]', required: false });
    expect(rows[3]).toMatchObject({ unit: 'dB', required: false, defaultValue: '0' });
  });

  it('writes a small shared object out where it is used and links a union to its own section', () => {
    const rows = fieldRows({ type: 'object', properties: { filter: { $ref: '#/components/schemas/Corner' }, rolloff: { $ref: '#/components/schemas/Shape' } } }, components);
    expect(names(rows)).toEqual(['filter', 'filter.cornerHz', 'rolloff']);
    expect(rows[0]).toMatchObject({ type: 'object', description: 'A corner.', links: [] });
    expect(rows[2]).toMatchObject({ type: 'Shape', links: ['Shape'], description: 'One of two.' });
    expect(linkedSchemas([rows], components)).toEqual(['Shape']);
  });

  it("reads zod's nullable (type [T, 'null'] and anyOf with null) as 'T | null'", () => {
    const rows = fieldRows(
      { type: 'object', properties: { a: { type: ['number', 'null'] }, b: { anyOf: [{ $ref: '#/components/schemas/Shape' }, { type: 'null' }] } } },
      components,
    );
    expect(rows.map((r) => r.type)).toEqual(['number | null', 'Shape | null']);
  });

  it("labels each form of a union by the field every form fixes (kind 'sealed')", () => {
    const rows = fieldRows({ $ref: '#/components/schemas/Shape' }, components);
    expect(names(rows)).toEqual(['kind', 'kind', 'q']);
    expect(rows.map((r) => r.description)).toEqual(["(kind 'none') ", "(kind 'sealed') ", "(kind 'sealed') Q."]);
  });
});
