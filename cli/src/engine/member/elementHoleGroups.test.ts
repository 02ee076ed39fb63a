import { describe, expect, it } from 'vitest';
import { braceMember, d9Member, legHole } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { elementHoleGroups } from './elementHoleGroups.js';
import { memberModel } from './memberModel.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

describe('elementHoleGroups', () => {
  it('a plate is one group, both edges free, holes at their y with their nominal 13/16 in (AISC 360-22 Table J3.3)', () => {
    const [plate, ...rest] = elementHoleGroups(memberModel(d9Member, AISC));
    expect(rest).toEqual([]);
    expect(plate).toMatchObject({
      element: 'plate',
      width: 14,
      thickness: 0.5,
      free: { low: true, high: true },
    });
    expect(plate!.holes.map((h) => [h.id, h.y, h.nominal])).toEqual([
      ['A', 2, 0.8125],
      ['B', 5, 0.8125],
      ['C', 9, 0.8125],
      ['D', 12, 0.8125],
    ]);
  });

  it('an angle: a group per leg with holes, free at the toe only, holes at u along the centreline', () => {
    // L4x4x3/8: a leg's centreline runs 4 − 0.375/2 = 3.8125 in from the heel's centreline corner to
    // the toe; a hole 2.5 in from the heel sits at u = 2.5 − 0.1875.
    const angle = { ...braceMember, holes: [legHole('A', 0), { ...legHole('B', 3), element: 'leg-b' }] };
    const groups = elementHoleGroups(memberModel(angle, AISC));
    expect(groups.map((g) => g.element)).toEqual(['leg-a', 'leg-b']);
    for (const g of groups) {
      expect(g.width).toBeCloseTo(3.8125, 12);
      expect(g.holes[0]!.y).toBeCloseTo(2.3125, 12);
    }
    // Each leg's free edge is at its toe; which end that is follows the leg's direction of u.
    expect(groups.map((g) => g.free.low !== g.free.high)).toEqual([true, true]);
  });
});
