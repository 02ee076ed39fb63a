// Tests read the example files from disk; the calc layer itself never does.
// eslint-disable-next-line no-restricted-imports
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCalcText } from './loadCalcText.js';
import type { CalcDocument, CalcError, LoadResult } from './types.js';

const EXAMPLES = new URL('../../../schema/examples/', import.meta.url);
const INVALID = new URL('../../../schema/invalid-examples/', import.meta.url);

function example(name: string): string {
  return readFileSync(new URL(name, EXAMPLES), 'utf8');
}

function loaded(r: LoadResult): CalcDocument {
  if (!r.ok) throw new Error(`expected ${r.file} to load: ${r.errors.map((e) => e.message).join('; ')}`);
  return r.document;
}

function failed(r: LoadResult): readonly CalcError[] {
  if (r.ok) throw new Error(`expected ${r.file} to fail`);
  return r.errors;
}

const MINIMAL = {
  format: 'ligament-calc',
  formatVersion: '1.0',
  meta: { project: 'Harbour Lantern Footbridge', preparedBy: 'Priya Halvorsen', date: '2026-11-20' },
  units: 'in',
  code: { standard: 'AISC 360-22', method: 'LRFD' },
  members: [
    {
      id: 'SP-1',
      kind: 'splice-plate',
      width: 14,
      thickness: '1/2',
      material: { Fy: 36, Fu: 58 },
      holes: [{ id: 'A1', x: 0, y: 2, bolt: '3/4' }],
      load: { directions: ['-x'] },
    },
  ],
};

/** MINIMAL with the first member's first hole (or member, or top level) changed. */
function variant(change: (doc: Record<string, unknown>, member: Record<string, unknown>) => void): string {
  const doc = structuredClone(MINIMAL) as unknown as Record<string, unknown>;
  const member = (doc['members'] as Record<string, unknown>[])[0]!;
  change(doc, member);
  return JSON.stringify(doc, null, 2);
}

describe('loadCalcText: valid examples', () => {
  const names = readdirSync(EXAMPLES).filter((n) => n.endsWith('.json'));

  it('finds between 6 and 16 valid examples', () => {
    expect(names.length).toBeGreaterThanOrEqual(6);
    expect(names.length).toBeLessThanOrEqual(16);
  });

  it.each(names)('%s loads without errors', (name) => {
    const doc = loaded(loadCalcText(example(name), name));
    expect(doc.format).toBe('ligament-calc');
    expect(doc.meta.project).toBe('Harbour Lantern Footbridge');
    expect(doc.members.length).toBeGreaterThan(0);
  });

  it('normalises fraction strings and inch bolt sizes to numbers (north-splice-correct)', () => {
    const doc = loaded(loadCalcText(example('north-splice-correct.json'), 'north-splice-correct.json'));
    expect(doc.profile).toEqual({ standard: 'AISC 360-22', method: 'LRFD', units: 'in' });
    const m = doc.members[0]!;
    expect(m.index).toBe(0);
    expect(m.description).toBe('North chord splice, outer plate');
    expect(m.input).toMatchObject({ id: 'SP-N1', kind: 'splice-plate', width: 14, thickness: 0.5 });
    expect(m.input.directions).toEqual(['-x', '+x']);
    expect(m.input.requiredStrength).toBe(180);
    expect(m.input.U).toBeUndefined();
    expect(m.input.holes[1]).toEqual({ id: 'B1', x: 2.5, y: 5, type: 'standard', boltDiameter: 0.75 });
    expect(m.claims?.chains?.[1]).toEqual({ holes: ['A1', 'B1', 'C1', 'D1'], netWidth: 11.54 });
    expect(m.claims?.An).toBe(5.77);
    // notes given as an array of lines are joined with line breaks
    expect(doc.meta.notes?.split('\n').length).toBeGreaterThan(5);
  });

  it('normalises metric bolts, slots and explicit sizes to {across, along} (deck-tie-slotted-mm)', () => {
    const doc = loaded(loadCalcText(example('deck-tie-slotted-mm.json'), 'deck-tie-slotted-mm.json'));
    const [s1, s2, s3, s4] = doc.members[0]!.input.holes;
    expect(s1).toEqual({ id: 'S1', x: 0, y: 50, type: 'short-slotted', slot: 'across', boltDiameter: 20 });
    expect(s2).toEqual({ id: 'S2', x: 0, y: 150, type: 'oversized', boltDiameter: 20 });
    expect(s3).toEqual({ id: 'S3', x: 80, y: 50, type: 'long-slotted', slot: 'along', boltDiameter: 20 });
    expect(s4).toEqual({ id: 'S4', x: 80, y: 150, type: 'standard', dimension: { across: 22, along: 22 } });
    expect(doc.members[0]!.input.U).toBe(0.9);
    expect(doc.profile.units).toBe('mm');
  });

  it('puts a slot across the load long side across (approach-gusset-slots)', () => {
    const doc = loaded(loadCalcText(example('approach-gusset-slots.json'), 'approach-gusset-slots.json'));
    const g2 = doc.members[0]!.input.holes[1]!;
    expect(g2.dimension).toEqual({ across: 1.5, along: 0.8125 });
    expect(g2.boltDiameter).toBe(0.75);
  });

  it('locate() resolves a pointer to its value, or to the nearest existing ancestor', () => {
    const text = example('north-splice-correct.json');
    const r = loadCalcText(text, 'north-splice-correct.json');
    if (!r.ok) throw new Error('did not load');
    const lines = text.split('\n');
    const at = (p: { line: number; column: number }) => lines[p.line - 1]!.slice(p.column - 1);
    expect(at(r.locate('/members/0/thickness'))).toMatch(/^"1\/2",/);
    expect(at(r.locate('/members/0/holes/1/x'))).toMatch(/^"2-1\/2"/);
    expect(at(r.locate('/members/0/holes/1/slot'))).toMatch(/^\{ "id": "B1"/);
    expect(r.locate('')).toEqual({ line: 1, column: 1 });
  });
});

describe('loadCalcText: invalid examples against their expected errors', () => {
  const names = readdirSync(INVALID).filter((n) => !n.endsWith('.expected.json') && !n.endsWith('.md'));

  it('has an expected file for every invalid example, and at least one example per error kind', () => {
    expect(names.length).toBeGreaterThanOrEqual(13);
    for (const n of names)
      expect(readdirSync(INVALID)).toContain(`${n.replace(/\.[^.]+$/, '')}.expected.json`);
  });

  it.each(names)('%s gives exactly the expected errors', (name) => {
    const text = readFileSync(new URL(name, INVALID), 'utf8');
    const expected = JSON.parse(
      readFileSync(new URL(`${name.replace(/\.[^.]+$/, '')}.expected.json`, INVALID), 'utf8'),
    ) as unknown[];
    const errors = failed(loadCalcText(text, `invalid/${name}`));
    expect(errors.map(({ pointer, line, column, rule }) => ({ pointer, line, column, rule }))).toEqual(
      expected,
    );
    for (const e of errors) {
      expect(e.file).toBe(`invalid/${name}`);
      expect(e.message).toContain(`(rule ${e.rule})`);
      if (e.pointer !== '') expect(e.message.startsWith(`${e.pointer}:`)).toBe(true);
    }
  });
});

describe('loadCalcText: messages in plain words', () => {
  it('says what the bound is for exclusiveMinimum, as "pointer: must be greater than 0 (rule …)"', () => {
    const errors = failed(
      loadCalcText(
        variant((_, m) => (m['thickness'] = 0)),
        'a.json',
      ),
    );
    expect(errors).toEqual([
      expect.objectContaining({
        pointer: '/members/0/thickness',
        rule: 'exclusiveMinimum',
        message: '/members/0/thickness: must be greater than 0 (rule exclusiveMinimum)',
      }),
    ]);
  });

  it('names a missing property at its parent object', () => {
    const errors = failed(
      loadCalcText(
        variant((d) => delete d['code']),
        'a.json',
      ),
    );
    expect(errors).toEqual([
      {
        file: 'a.json',
        pointer: '',
        line: 1,
        column: 1,
        rule: 'required',
        message: '(document): missing required property "code" (rule required)',
      },
    ]);
  });

  it('suggests the nearest property for a typo and points at the misspelt key', () => {
    const text = variant((_, m) => ((m['material'] as Record<string, unknown>)['Fuu'] = 58));
    const errors = failed(loadCalcText(text, 'a.json'));
    const typo = errors.find((e) => e.rule === 'additionalProperties')!;
    expect(typo.pointer).toBe('/members/0/material/Fuu');
    expect(typo.message).toBe(
      '/members/0/material/Fuu: unknown property "Fuu" (did you mean "Fu"?) (rule additionalProperties)',
    );
    const line = text.split('\n')[typo.line - 1]!;
    expect(line.slice(typo.column - 1)).toMatch(/^"Fuu"/);
  });

  it('folds the bolt-or-size alternative into one anyOf error', () => {
    const errors = failed(
      loadCalcText(
        variant((_, m) => (m['holes'] = [{ id: 'A1', x: 0, y: 2 }])),
        'a.json',
      ),
    );
    expect(errors.map((e) => [e.pointer, e.rule, e.message])).toEqual([
      ['/members/0/holes/0', 'anyOf', '/members/0/holes/0: needs "bolt" or "size" (rule anyOf)'],
    ]);
  });

  it('explains lengths that fail the pattern and enums with their allowed values', () => {
    const errors = failed(
      loadCalcText(
        variant((d, m) => {
          m['width'] = '14 in';
          (d['code'] as Record<string, unknown>)['method'] = 'WSD';
        }),
        'a.json',
      ),
    );
    expect(errors.map((e) => e.message)).toEqual([
      '/code/method: must be one of "LRFD", "ASD", "partial-factor" or "LSD", not "WSD" (rule enum)',
      '/members/0/width: "14 in" is not a length: a number greater than 0, or a string such as "2-1/8", "15/16", "3" or "1.5" (rule pattern)',
    ]);
  });

  it('rejects repeated load directions, a bad date and a slot on a round hole', () => {
    const dup = failed(
      loadCalcText(
        variant((_, m) => (m['load'] = { directions: ['-x', '-x'] })),
        'a.json',
      ),
    );
    expect(dup.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/load/directions', 'uniqueItems']]);
    const date = failed(
      loadCalcText(
        variant((d) => ((d['meta'] as Record<string, unknown>)['date'] = '2026-02-30')),
        'a.json',
      ),
    );
    expect(date.map((e) => [e.pointer, e.rule, e.message])).toEqual([
      ['/meta/date', 'format', '/meta/date: "2026-02-30" is not a date written YYYY-MM-DD (rule format)'],
    ]);
    const slot = failed(
      loadCalcText(
        variant((_, m) => (m['holes'] = [{ id: 'A1', x: 0, y: 2, bolt: '3/4', slot: 'along' }])),
        'a.json',
      ),
    );
    expect(slot.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/holes/0/slot', 'slot-on-round-hole']]);
  });

  it('checks units: metric bolts only in mm files, inch fractions only in in files', () => {
    const metricInInch = failed(
      loadCalcText(
        variant((_, m) => (m['holes'] = [{ id: 'A1', x: 0, y: 2, bolt: 'M20' }])),
        'a.json',
      ),
    );
    expect(metricInInch.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/holes/0/bolt', 'bolt-units']]);
    const inchInMm = failed(
      loadCalcText(
        variant((d, m) => {
          d['units'] = 'mm';
          m['width'] = 350;
          m['thickness'] = 12;
          m['holes'] = [{ id: 'A1', x: 0, y: 50, bolt: '3/4' }];
        }),
        'a.json',
      ),
    );
    expect(inchInMm.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/holes/0/bolt', 'bolt-units']]);
  });

  it('reports a string length in a mm file once, under mm-plain-number', () => {
    const errors = failed(
      loadCalcText(
        variant((d, m) => {
          d['units'] = 'mm';
          m['width'] = '1/0';
          m['thickness'] = 12;
          m['holes'] = [{ id: 'A1', x: 0, y: 50, bolt: 'M20' }];
        }),
        'a.json',
      ),
    );
    expect(errors.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/width', 'mm-plain-number']]);
  });

  it('reports a bolt the hole table does not know, and a slot shorter than it is wide', () => {
    const unknownBolt = failed(
      loadCalcText(
        variant((_, m) => (m['holes'] = [{ id: 'A1', x: 0, y: 2, bolt: 0.8 }])),
        'a.json',
      ),
    );
    expect(unknownBolt.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/holes/0/bolt', 'bolt-size']]);
    expect(unknownBolt[0]!.message).toContain('no hole for a 0.8 in bolt');
    const shortSlot = failed(
      loadCalcText(
        variant(
          (_, m) =>
            (m['holes'] = [
              {
                id: 'A1',
                x: 0,
                y: 2,
                type: 'short-slotted',
                slot: 'along',
                size: { width: 1, length: '13/16' },
              },
            ]),
        ),
        'a.json',
      ),
    );
    expect(shortSlot.map((e) => [e.pointer, e.rule])).toEqual([
      ['/members/0/holes/0/size/length', 'slot-size'],
    ]);
  });

  it('treats a number too large for a double as not a number, and asks slotted holes for {width, length}', () => {
    const huge = failed(
      loadCalcText(variant(() => undefined).replace('"width": 14', '"width": 1e400'), 'a.json'),
    );
    expect(huge.map((e) => e.message)).toEqual([
      '/members/0/width: must be a number or a string, not Infinity (rule type)',
    ]);
    const slot = failed(
      loadCalcText(
        variant(
          (_, m) => (m['holes'] = [{ id: 'A1', x: 0, y: 2, type: 'long-slotted', slot: 'along', size: 0.8 }]),
        ),
        'a.json',
      ),
    );
    expect(slot.map((e) => e.message)).toEqual([
      '/members/0/holes/0/size: must be an object, not 0.8 (a slotted hole\'s size is { "width", "length" }) (rule type)',
    ]);
  });

  it('accepts negative x and zero y, and reports a zero-y hole that reaches past the edge (LG301)', () => {
    const neg = loaded(
      loadCalcText(
        variant((_, m) => (m['holes'] = [{ id: 'A1', x: '-3/4', y: 2, bolt: '3/4' }])),
        'a.json',
      ),
    );
    expect(neg.members[0]!.input.holes[0]!.x).toBe(-0.75);
    const edge = failed(
      loadCalcText(
        variant((_, m) => (m['holes'] = [{ id: 'A1', x: 0, y: '0', bolt: '3/4' }])),
        'a.json',
      ),
    );
    expect(edge.map((e) => [e.pointer, e.rule])).toEqual([['/members/0/holes/0', 'hole-outside-member']]);
  });

  // Four gauge lines 1/2 in apart in a 2-1/2 in plate, staggered 0.7 in: no two 13/16 in holes overlap
  // (centres 0.86 in apart), yet the zigzag chain deducts 4 × 0.875 and gets back 3 × 0.7²/(4 · 0.5):
  // wn = 2.5 − 3.5 + 0.735 = −0.265 in (AISC 360 B4.3b hole width and s²/4g, common practice).
  const ZIGZAG = [
    { id: 'A', x: 0, y: '1/2', bolt: '3/4' },
    { id: 'B', x: 0.7, y: 1, bolt: '3/4' },
    { id: 'C', x: 0, y: '1-1/2', bolt: '3/4' },
    { id: 'D', x: 0.7, y: 2, bolt: '3/4' },
  ];

  it('rejects a member whose least chain leaves a net width ≤ 0 (rule net-area-positive), with file, pointer and position', () => {
    const text = variant((_, m) => {
      m['width'] = '2-1/2';
      m['holes'] = ZIGZAG;
    });
    const errors = failed(loadCalcText(text, 'zigzag.json'));
    expect(errors.map((e) => [e.file, e.pointer, e.rule])).toEqual([
      ['zigzag.json', '/members/0/holes', 'net-area-positive'],
    ]);
    expect(errors[0]!.message).toBe(
      '/members/0/holes: chain A-B-C-D loaded from −x leaves a net width of -0.265 in (width 2.500 in − holes 3.500 in + s²/4g 0.735 in); the holes take the whole width, so it is not a tension member (rule net-area-positive)',
    );
    const lines = text.split('\n');
    expect(lines[errors[0]!.line - 1]!.trim()).toBe('"holes": [');
  });

  it('accepts the same holes in a plate wide enough for a positive net width', () => {
    // 3-1/2 in: the gauge lines keep their spacing, the edges get 1/2 in more each side → wn = 0.735 in.
    const doc = loaded(
      loadCalcText(
        variant((_, m) => {
          m['width'] = '3-1/2';
          m['holes'] = ZIGZAG.map((h, i) => ({ ...h, y: 1 + 0.5 * i }));
        }),
        'wide.json',
      ),
    );
    expect(doc.members[0]!.input.width).toBe(3.5);
  });

  it('reports duplicate member ids at the second id', () => {
    const errors = failed(
      loadCalcText(
        variant((d, m) => (d['members'] = [m, structuredClone(m)])),
        'a.json',
      ),
    );
    expect(errors.map((e) => [e.pointer, e.rule])).toEqual([['/members/1/id', 'duplicate-member-id']]);
  });
});

describe('loadCalcText: JSON syntax', () => {
  it('reports an empty or blank file once, at 1:1', () => {
    for (const text of ['', '  \n\t']) {
      expect(failed(loadCalcText(text, 'e.json'))).toEqual([
        {
          file: 'e.json',
          pointer: '',
          line: 1,
          column: 1,
          rule: 'json-syntax',
          message: 'file is empty (rule json-syntax)',
        },
      ]);
    }
  });

  it('reports a trailing comma where it stops the parse', () => {
    const errors = failed(loadCalcText('{\n  "units": "in",\n}', 't.json'));
    expect(errors).toEqual([expect.objectContaining({ line: 3, column: 1, rule: 'json-syntax' })]);
    expect(errors[0]!.message).toContain('trailing comma');
  });

  it('refuses comments, which JSON does not have', () => {
    const errors = failed(loadCalcText('{\n  // units\n  "units": "in"\n}', 'c.json'));
    expect(errors.map((e) => [e.line, e.column, e.rule])).toEqual([[2, 3, 'json-syntax']]);
    expect(errors[0]!.message).toContain('comments are not allowed');
  });

  it('reports an unterminated document at its end', () => {
    const errors = failed(loadCalcText('{\n  "units": "in"', 'u.json'));
    expect(errors.map((e) => [e.line, e.rule])).toEqual([[2, 'json-syntax']]);
    expect(errors[0]!.message).toContain('before the end of the file');
  });

  it('reads files with a byte order mark and CRLF line ends, keeping positions right', () => {
    const text = `\uFEFF${variant((_, m) => (m['thickness'] = -1)).replace(/\n/g, '\r\n')}`;
    const errors = failed(loadCalcText(text, 'w.json'));
    const line = text.split('\r\n').findIndex((l) => l.includes('"thickness"')) + 1;
    expect(errors.map((e) => [e.pointer, e.line, e.rule])).toEqual([
      ['/members/0/thickness', line, 'exclusiveMinimum'],
    ]);
    expect(loadCalcText(`\uFEFF${variant(() => undefined)}`, 'ok.json').ok).toBe(true);
  });

  it('rejects a top level that is not an object', () => {
    const errors = failed(loadCalcText('[1, 2]', 'arr.json'));
    expect(errors.map((e) => [e.pointer, e.rule, e.message])).toEqual([
      ['', 'type', '(document): must be an object, not [1,2] (rule type)'],
    ]);
  });
});
