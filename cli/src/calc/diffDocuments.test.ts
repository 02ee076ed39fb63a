import { describe, expect, it } from 'vitest';
import { diffDocuments } from './diffDocuments.js';
import { loadCalcText } from './loadCalcText.js';
import type { CalcDocument } from './types.js';

// Hand-made pairs of calc files (fictional Harbour Lantern Footbridge members); each test lists the
// changes a checker reading both files would name, written out by hand.

function load(doc: object, name: string): CalcDocument {
  const result = loadCalcText(JSON.stringify(doc, null, 2), name);
  if (!result.ok) throw new Error(`${name}: ${result.errors.map((e) => e.message).join('; ')}`);
  return result.document;
}

const META = { project: 'Harbour Lantern Footbridge', preparedBy: 'Priya Halvorsen', date: '2026-11-20' };

const ISSUE_A = {
  format: 'ligament-calc',
  formatVersion: '1.0',
  meta: META,
  units: 'in',
  code: { standard: 'AISC 360-22', method: 'LRFD' },
  members: [
    {
      id: 'SP-1',
      kind: 'splice-plate',
      width: 14,
      thickness: '1/2',
      material: { grade: 'A36', Fy: 36, Fu: 58 },
      holes: [
        { id: 'A1', x: 0, y: 2, bolt: '3/4' },
        { id: 'B1', x: 2.5, y: 5, bolt: '3/4' },
        { id: 'C1', x: 2.5, y: 9, bolt: '3/4' },
        { id: 'D1', x: 0, y: 12, bolt: '3/4' },
      ],
      load: { directions: ['-x'] },
      claims: {
        An: 5.75,
        controllingChain: { holes: ['A1', 'B1', 'C1', 'D1'], netWidth: 11.5 },
        chains: [{ holes: ['A1', 'D1'], netWidth: 12.25 }],
      },
    },
    {
      id: 'SP-2',
      kind: 'plate',
      width: 8,
      thickness: '3/8',
      material: { grade: 'A36', Fy: 36, Fu: 58 },
      holes: [{ id: 'A1', x: 0, y: 4, bolt: '3/4' }],
      load: { directions: ['-x'] },
    },
  ],
};

const ISSUE_B = {
  ...ISSUE_A,
  code: { standard: 'AISC 360-22', method: 'ASD' },
  members: [
    {
      id: 'SP-1',
      kind: 'splice-plate',
      width: 14,
      thickness: '5/8',
      material: { grade: 'A572 Gr. 50', Fy: 50, Fu: 65 },
      holes: [
        { id: 'A1', x: 0, y: 2, bolt: '3/4' },
        { id: 'B1', x: 2.5, y: 5.5, bolt: '3/4' },
        { id: 'C1', x: 2.5, y: 9, bolt: '7/8' },
        { id: 'E1', x: 5, y: 7, bolt: '3/4' },
      ],
      load: { directions: ['-x'] },
      claims: {
        An: 5.125,
        Ae: 5.125,
        controllingChain: { holes: ['A1', 'B1', 'C1'], netWidth: 11.9, direction: '-x' },
        chains: [{ holes: ['A1', 'B1', 'C1'], netWidth: 11.9, direction: '-x' }],
      },
    },
    {
      id: 'SP-3',
      kind: 'plate',
      width: 10,
      thickness: '1/2',
      material: { grade: 'A36', Fy: 36, Fu: 58 },
      holes: [
        { id: 'A1', x: 0, y: 3, bolt: '3/4' },
        { id: 'B1', x: 0, y: 7, bolt: '3/4' },
      ],
      load: { directions: ['-x', '+x'] },
    },
  ],
};

describe('diffDocuments', () => {
  it('names nothing for two copies of the same file, whatever the key order or the way a length is written', () => {
    const a = load(ISSUE_A, 'a.json');
    const reordered = {
      members: ISSUE_A.members.map((m) => ({ ...m, thickness: m.id === 'SP-1' ? 0.5 : '0.375' })),
      code: ISSUE_A.code,
      units: 'in',
      meta: META,
      formatVersion: '1.0',
      format: 'ligament-calc',
    };
    expect(diffDocuments(a, load(reordered, 'b.json'))).toEqual([]);
  });

  it('lists code, member, hole and claim changes old → new with units, then added and removed members', () => {
    const changes = diffDocuments(load(ISSUE_A, 'issue-a.json'), load(ISSUE_B, 'issue-b.json'));
    expect(changes).toEqual([
      {
        scope: 'profile',
        change: 'changed',
        field: 'code.method',
        label: 'design method',
        before: 'LRFD',
        after: 'ASD',
      },
      {
        scope: 'member',
        change: 'changed',
        memberId: 'SP-1',
        field: 'thickness',
        label: 'thickness',
        before: '0.5 in',
        after: '0.625 in',
      },
      {
        scope: 'member',
        change: 'changed',
        memberId: 'SP-1',
        field: 'material.grade',
        label: 'steel grade',
        before: 'A36',
        after: 'A572 Gr. 50',
      },
      {
        scope: 'member',
        change: 'changed',
        memberId: 'SP-1',
        field: 'material.Fy',
        label: 'Fy',
        before: '36 ksi',
        after: '50 ksi',
      },
      {
        scope: 'member',
        change: 'changed',
        memberId: 'SP-1',
        field: 'material.Fu',
        label: 'Fu',
        before: '58 ksi',
        after: '65 ksi',
      },
      {
        scope: 'hole',
        change: 'moved',
        memberId: 'SP-1',
        holeId: 'B1',
        field: 'position',
        label: 'position',
        before: '(2.5, 5) in',
        after: '(2.5, 5.5) in',
      },
      {
        scope: 'hole',
        change: 'changed',
        memberId: 'SP-1',
        holeId: 'C1',
        field: 'boltDiameter',
        label: 'bolt diameter',
        before: '0.75 in',
        after: '0.875 in',
      },
      { scope: 'hole', change: 'added', memberId: 'SP-1', holeId: 'E1', after: '(5, 7) in' },
      { scope: 'hole', change: 'removed', memberId: 'SP-1', holeId: 'D1', before: '(0, 12) in' },
      {
        scope: 'claim',
        change: 'changed',
        memberId: 'SP-1',
        field: 'claims.An',
        label: 'claimed An',
        before: '5.75 in²',
        after: '5.125 in²',
      },
      {
        scope: 'claim',
        change: 'added',
        memberId: 'SP-1',
        field: 'claims.Ae',
        label: 'claimed Ae',
        after: '5.125 in²',
      },
      {
        scope: 'claim',
        change: 'changed',
        memberId: 'SP-1',
        field: 'claims.controllingChain',
        label: 'claimed controlling chain',
        before: 'A1–B1–C1–D1 (wn 11.5 in)',
        after: 'A1–B1–C1 (−x, wn 11.9 in)',
      },
      {
        scope: 'claim',
        change: 'added',
        memberId: 'SP-1',
        field: 'claims.chains',
        label: 'claimed chain',
        after: 'A1–B1–C1 (−x, wn 11.9 in)',
      },
      {
        scope: 'claim',
        change: 'removed',
        memberId: 'SP-1',
        field: 'claims.chains',
        label: 'claimed chain',
        before: 'A1–D1 (wn 12.25 in)',
      },
      { scope: 'member', change: 'added', memberId: 'SP-3', after: '2 holes' },
      { scope: 'member', change: 'removed', memberId: 'SP-2', before: '1 hole' },
    ]);
  });

  it('shows a claimed chain whose net width changed as one change of that chain', () => {
    const a = structuredClone(ISSUE_A);
    const b = structuredClone(ISSUE_A);
    b.members[0]!.claims!.chains = [{ holes: ['A1', 'D1'], netWidth: 12.3 }];
    expect(diffDocuments(load(a, 'a.json'), load(b, 'b.json'))).toEqual([
      {
        scope: 'claim',
        change: 'changed',
        memberId: 'SP-1',
        field: 'claims.chains',
        label: 'claimed chain',
        before: 'A1–D1 (wn 12.25 in)',
        after: 'A1–D1 (wn 12.3 in)',
      },
    ]);
  });

  it('lists every quantity in both unit systems when a file goes from inches to millimetres', () => {
    const inch = {
      ...ISSUE_A,
      members: [
        {
          id: 'T-1',
          kind: 'plate',
          width: 8,
          thickness: '1/2',
          material: { grade: 'A36', Fy: 36, Fu: 58 },
          holes: [{ id: 'A1', x: 0, y: 4, bolt: '3/4' }],
          load: { directions: ['-x'] },
        },
      ],
    };
    const metric = {
      ...ISSUE_A,
      units: 'mm',
      members: [
        {
          id: 'T-1',
          kind: 'plate',
          width: 200,
          thickness: 12,
          material: { grade: 'S355', Fy: 355, Fu: 490 },
          holes: [{ id: 'A1', x: 0, y: 100, bolt: 'M20' }],
          load: { directions: ['-x'] },
        },
      ],
    };
    const changes = diffDocuments(load(inch, 'inch.json'), load(metric, 'metric.json'));
    expect(changes.map((c) => [c.field, c.before, c.after])).toEqual([
      ['units', 'in', 'mm'],
      ['width', '8 in', '200 mm'],
      ['thickness', '0.5 in', '12 mm'],
      ['material.grade', 'A36', 'S355'],
      ['material.Fy', '36 ksi', '355 MPa'],
      ['material.Fu', '58 ksi', '490 MPa'],
      ['position', '(0, 4) in', '(0, 100) mm'],
      ['boltDiameter', '0.75 in', '20 mm'],
    ]);
    // Across a change of units a hole is not said to have moved.
    expect(changes.find((c) => c.field === 'position')?.change).toBe('changed');
  });

  it('reports load and connection data of a rolled shape', () => {
    const angle = (length: number, U?: number) => ({
      ...ISSUE_A,
      members: [
        {
          id: 'BR-1',
          kind: 'angle',
          section: { shape: 'angle', a: 4, b: 4, t: '3/8' },
          material: { grade: 'A36', Fy: 36, Fu: 58 },
          holes: [
            { id: 'A1', element: 'leg-a', gauge: 2.5, x: 0, bolt: '3/4' },
            { id: 'A2', element: 'leg-a', gauge: 2.5, x: 3, bolt: '3/4' },
          ],
          load: {
            directions: ['-x'],
            ...(U !== undefined ? { U } : { shearLag: { connected: 'leg', length } }),
          },
        },
      ],
    });
    const changes = diffDocuments(load(angle(3), 'a.json'), load(angle(3, 0.8), 'b.json'));
    expect(changes).toEqual([
      {
        scope: 'member',
        change: 'added',
        memberId: 'BR-1',
        field: 'U',
        label: 'shear lag factor U',
        after: '0.8',
      },
      {
        scope: 'member',
        change: 'removed',
        memberId: 'BR-1',
        field: 'shearLag.connected',
        label: 'connected element',
        before: 'leg',
      },
      {
        scope: 'member',
        change: 'removed',
        memberId: 'BR-1',
        field: 'shearLag.length',
        label: 'connection length',
        before: '3 in',
      },
    ]);
  });
});
