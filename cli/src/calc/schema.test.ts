import { describe, expect, it } from 'vitest';
import { CALC_SCHEMA, SCHEMA_ID, SCHEMA_VERSION } from './index.js';
import { calcValidator } from './validateSchema.js';

type Schema = Record<string, unknown>;

/** Every subschema with its path, following properties, items, $defs and the applicators. */
function subschemas(schema: Schema, path = '#'): [string, Schema][] {
  const out: [string, Schema][] = [[path, schema]];
  const visit = (s: unknown, p: string) => {
    if (s && typeof s === 'object' && !Array.isArray(s)) out.push(...subschemas(s as Schema, p));
  };
  for (const key of ['properties', '$defs'] as const) {
    const map = schema[key] as Record<string, unknown> | undefined;
    for (const [name, s] of Object.entries(map ?? {})) visit(s, `${path}/${key}/${name}`);
  }
  for (const key of ['items', 'if', 'then', 'else', 'not'] as const) visit(schema[key], `${path}/${key}`);
  for (const key of ['anyOf', 'oneOf', 'allOf'] as const) {
    ((schema[key] as unknown[] | undefined) ?? []).forEach((s, i) => visit(s, `${path}/${key}/${i}`));
  }
  return out;
}

describe('calc.schema.json', () => {
  it('is identified by a URN and reads format version 1.0', () => {
    expect(CALC_SCHEMA.$id).toBe('urn:ligament:schema:calc:1.0');
    expect(SCHEMA_ID).toBe(CALC_SCHEMA.$id);
    expect(SCHEMA_VERSION).toBe('1.0');
    expect(CALC_SCHEMA['$schema']).toBe('https://json-schema.org/draft/2020-12/schema');
  });

  it('compiles under ajv strict mode', () => {
    expect(typeof calcValidator()).toBe('function');
    expect(calcValidator()).toBe(calcValidator());
  });

  it('describes every property and every definition', () => {
    const missing = subschemas(CALC_SCHEMA)
      .filter(([p]) => /\/(properties|\$defs)\/[^/]+$/.test(p))
      .filter(
        ([p, s]) => typeof s['description'] !== 'string' && !p.includes('/if/') && !p.includes('/anyOf/'),
      )
      .map(([p]) => p);
    expect(missing).toEqual([]);
  });

  it('closes every object with properties, so a typo is an error', () => {
    const open = subschemas(CALC_SCHEMA)
      .filter(([p, s]) => s['type'] === 'object' && s['properties'] && !/\/(if|then|else|anyOf)/.test(p))
      .filter(([, s]) => s['additionalProperties'] !== false)
      .map(([p]) => p);
    expect(open).toEqual([]);
  });

  it('accepts the format example of the team brief', () => {
    const brief = {
      $schema: 'urn:ligament:schema:calc:1.0',
      format: 'ligament-calc',
      formatVersion: '1.0',
      meta: {
        project: 'Harbour Lantern Footbridge',
        preparedBy: 'Priya Halvorsen',
        firm: 'Fennick & Ode Structural',
        date: '2026-11-20',
        tool: { name: 'ligament', version: '0.1.0' },
        reference: 'r',
        notes: 'n',
      },
      units: 'in',
      code: { standard: 'AISC 360-22', method: 'LRFD' },
      members: [
        {
          id: 'SP-1',
          kind: 'splice-plate',
          description: 'd',
          width: 14,
          thickness: '1/2',
          material: { grade: 'A36', Fy: 36, Fu: 58 },
          holes: [
            { id: 'A1', x: 0, y: 2, bolt: '3/4' },
            { id: 'B1', x: '2-1/2', y: 5, bolt: '3/4', type: 'short-slotted', slot: 'across' },
            { id: 'C1', x: 5, y: 9, size: '15/16' },
            {
              id: 'D1',
              x: 5,
              y: 12,
              size: { width: '13/16', length: '1-7/8' },
              type: 'long-slotted',
              slot: 'along',
            },
          ],
          load: { directions: ['-x', '+x'], U: 1.0, required: 180 },
          claims: {
            chains: [{ holes: ['A1', 'B1', 'C1', 'D1'], netWidth: 11.5, direction: '-x' }],
            controllingChain: { holes: ['A1', 'B1', 'C1', 'D1'], direction: '-x' },
            Ag: 7.0,
            An: 5.75,
            U: 1.0,
            Ae: 5.75,
            yielding: 226.8,
            rupture: 250.1,
            available: 226.8,
          },
        },
      ],
    };
    const validate = calcValidator();
    expect(validate(brief)).toBe(true);
    expect(validate.errors ?? null).toBeNull();
  });
});
