import type { HoleInput, UnitSystem } from '../types.js';

// AISC 360 Table J3.5 / J3.5M, Values of Edge Distance Increment C2 (from memory of AISC 360-10 and
// 360-16): rows by nominal bolt diameter, columns oversized hole, short slot perpendicular to the
// edge; a long slot perpendicular to the edge takes 0.75 d; a slot parallel to the edge takes 0.
const INCH: readonly (readonly [number, number, number])[] = [
  [0.875, 1 / 16, 1 / 8],
  [1, 1 / 8, 1 / 8],
  [Number.POSITIVE_INFINITY, 1 / 8, 3 / 16],
];
const METRIC: readonly (readonly [number, number, number])[] = [
  [22, 2, 3],
  [24, 3, 3],
  [Number.POSITIVE_INFINITY, 3, 5],
];

/**
 * The increment C2 added to the Table J3.4 minimum edge distance of a standard hole for an oversized
 * or slotted hole (AISC 360 J3.4, Table J3.5 / J3.5M; from memory), measured to a longitudinal edge
 * (parallel to the load): a slot running along the load is parallel to that edge (C2 = 0), one running
 * across it is perpendicular. A long slot perpendicular to the edge takes 0.75 d, reduced by half of
 * (maximum long-slot length 2.5 d − actual length) when an explicit slot length is given (table note).
 *
 * @param hole - the hole (type, slot, bolt diameter, explicit dimension)
 * @param units - the file's unit system
 * @returns C2 in the file's unit (0 for standard holes and for holes without a bolt size)
 * @example
 * edgeDistanceIncrement({ id: 'A', x: 0, y: 2, boltDiameter: 0.75, type: 'oversized' }, 'in') // → 0.0625
 * edgeDistanceIncrement({ id: 'A', x: 0, y: 2, boltDiameter: 0.75, type: 'long-slotted', slot: 'across' }, 'in') // → 0.5625
 */
export function edgeDistanceIncrement(hole: HoleInput, units: UnitSystem): number {
  const d = hole.boltDiameter;
  if (d === undefined || hole.type === 'standard') return 0;
  const row = (units === 'in' ? INCH : METRIC).find(([upTo]) => d <= upTo + 1e-9)!;
  if (hole.type === 'oversized') return row[1];
  if (hole.slot !== 'across') return 0;
  if (hole.type === 'short-slotted') return row[2];
  const full = 0.75 * d;
  if (!hole.dimension) return full;
  const length = Math.max(hole.dimension.across, hole.dimension.along);
  return Math.max(0, full - 0.5 * Math.max(0, 2.5 * d - length));
}
