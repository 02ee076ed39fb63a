import { describe, expect, it } from 'vitest';
import { inspectLayout } from './inspectLayout.js';
import type { CodeProfile, HoleInput, MemberInput } from '../types.js';

const profile: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const bolt = (id: string, x: number, y: number, over: Partial<HoleInput> = {}): HoleInput => ({
  id,
  x,
  y,
  boltDiameter: 0.75,
  type: 'standard',
  ...over,
});
const member = (holes: HoleInput[]): MemberInput => ({
  id: 'SP-1',
  kind: 'splice-plate',
  width: 14,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  holes,
});

describe('inspectLayout', () => {
  it('finds nothing wrong with the D.9 layout (AISC Design Examples v13.0 D.9 geometry)', () => {
    expect(
      inspectLayout(
        member([bolt('A', 0, 2), bolt('B', 2.5, 5), bolt('C', 2.5, 9), bolt('D', 0, 12)]),
        profile,
      ),
    ).toEqual([]);
  });

  it('reports a hole centred outside 0..width as LG301 with its pointer', () => {
    expect(inspectLayout(member([bolt('A', 0, 2), bolt('B', 0, 14.5)]), profile)).toEqual([
      expect.objectContaining({
        code: 'LG301',
        name: 'hole-outside-member',
        rule: 'hole-outside-member',
        pointer: '/holes/1',
        holes: ['B'],
      }),
    ]);
  });

  it('reports a hole whose 13/16 in outline reaches past the edge (centre at y = 0.3)', () => {
    const [issue] = inspectLayout(member([bolt('A', 0, 0.3)]), profile);
    expect(issue).toMatchObject({ code: 'LG301', pointer: '/holes/0' });
    expect(issue!.message).toMatch(/reaches past the plate edge at y = 0/);
  });

  it('lets a hole touch the edge exactly', () => {
    expect(inspectLayout(member([bolt('A', 0, 13 / 32)]), profile)).toEqual([]);
  });

  it('reports two round holes whose outlines intersect as LG302, pointing at the later one', () => {
    expect(inspectLayout(member([bolt('A', 0, 5), bolt('B', 0.5, 5.2)]), profile)).toEqual([
      expect.objectContaining({
        code: 'LG302',
        name: 'holes-overlap',
        pointer: '/holes/1',
        holes: ['A', 'B'],
      }),
    ]);
  });

  it('reports a long slot reaching into a neighbouring hole, but not holes 3 in apart', () => {
    const slot = bolt('S', 0, 5, { type: 'long-slotted', slot: 'along' }); // 13/16 × 1-7/8 along x
    expect(inspectLayout(member([slot, bolt('B', 1.3, 5)]), profile).map((i) => i.code)).toEqual(['LG302']);
    expect(inspectLayout(member([bolt('A', 0, 5), bolt('B', 3, 5)]), profile)).toEqual([]);
  });

  it('reports a repeated hole id as LG303 at the second hole’s id', () => {
    expect(inspectLayout(member([bolt('A', 0, 2), bolt('A', 0, 12)]), profile)).toEqual([
      expect.objectContaining({ code: 'LG303', name: 'duplicate-hole-id', pointer: '/holes/1/id' }),
    ]);
  });

  it('falls back to the explicit dimension or bolt diameter without a profile', () => {
    // Without the table a 3/4 in bolt at y = 0.4 is taken as 0.75 wide (inside); with it 13/16 (past the edge).
    expect(inspectLayout(member([bolt('A', 0, 0.4)])).map((i) => i.code)).toEqual([]);
    expect(inspectLayout(member([bolt('A', 0, 0.4)]), profile).map((i) => i.code)).toEqual(['LG301']);
    const explicit = bolt('A', 0, 0.4, { dimension: { across: 1, along: 1 } });
    expect(inspectLayout(member([explicit])).map((i) => i.code)).toEqual(['LG301']);
  });

  it('skips the outline of a hole whose bolt size the table does not know (the loader reports it)', () => {
    expect(inspectLayout(member([bolt('A', 0, 5, { boltDiameter: 0.8 })]), profile)).toEqual([]);
  });

  it('finds nothing without holes', () => {
    expect(inspectLayout(member([]), profile)).toEqual([]);
  });
});
