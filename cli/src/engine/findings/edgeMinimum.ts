import { edgeDistanceIncrement } from '../holes/edgeDistanceIncrement.js';
import { formatQuantity } from './formatQuantity.js';
import { minimumEdgeDistance } from '../holes/minimumEdgeDistance.js';
import type { CodeProfile, HoleInput } from '../types.js';

/** The least edge distance LG202 holds a hole to, and the words that explain it. */
export interface EdgeMinimum {
  readonly minimum: number;
  /** e.g. `1.06 in of AISC 360 Table J3.4 (1.00 in) + C2 0.06 in for an oversized hole (Table J3.5)`. */
  readonly text: string;
}

/**
 * The minimum edge distance across the load for one hole under AISC 360: Table J3.4 / J3.4M for the
 * bolt plus the Table J3.5 increment C2 for an oversized or slotted hole ({@link edgeDistanceIncrement},
 * from memory). Under AISC 360-10 the rolled or thermally cut edge column is used (calc files do not say
 * how an edge was cut, and a warning must not fire on a good detail); the sheared-edge value of that
 * edition is named in the text when the hole is closer than it (from memory).
 *
 * @param hole - the hole, with its bolt diameter
 * @param profile - the file's code profile
 * @param edge - the hole's distance to the edge, to say whether the sheared-edge value matters
 * @returns the minimum and its explanation, or undefined for a bolt the table does not list
 * @example
 * // 3/4 in bolt, oversized hole, AISC 360-22: 1 + 1/16 in
 * edgeMinimum({ id: 'A', x: 0, y: 1, boltDiameter: 0.75, type: 'oversized' }, aisc, 1)?.minimum // → 1.0625
 */
export function edgeMinimum(hole: HoleInput, profile: CodeProfile, edge: number): EdgeMinimum | undefined {
  const u = profile.units;
  if (hole.boltDiameter === undefined) return undefined;
  const base = minimumEdgeDistance(hole.boltDiameter, u);
  if (base === undefined) return undefined;
  const c2 = edgeDistanceIncrement(hole, u);
  const minimum = base + c2;
  const table = u === 'in' ? 'J3.4' : 'J3.4M';
  const what =
    hole.type === 'oversized'
      ? 'an oversized hole'
      : `a ${hole.type} hole ${hole.slot ?? ''} the load`.trim();
  let text =
    c2 > 0
      ? `${formatQuantity(minimum, 'length', u)} of AISC 360 Table ${table} (${formatQuantity(base, 'length', u)}) + C2 ${formatQuantity(c2, 'length', u)} for ${what} (Table ${u === 'in' ? 'J3.5' : 'J3.5M'})`
      : `${formatQuantity(minimum, 'length', u)} of AISC 360 Table ${table}`;
  if (profile.standard === 'AISC 360-10') {
    const sheared = minimumEdgeDistance(hole.boltDiameter, u, 'sheared-2010');
    text += ', rolled or thermally cut edges';
    if (sheared !== undefined && edge < sheared + c2) {
      text += `; at a sheared edge AISC 360-10 asks ${formatQuantity(sheared + c2, 'length', u)} (from memory)`;
    }
  }
  return { minimum, text };
}
