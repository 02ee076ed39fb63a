import type { UnitSystem } from '../types.js';

// AISC 360-16 Table J3.4, Minimum Edge Distance from Center of Standard Hole to Edge of Connected
// Part, in: published (as listed in conformance/SOURCES.md). The 2022 edition keeps it; it is the 2010
// edition's column "at rolled edges of plates, shapes or bars, or thermally cut edges" (from memory).
// AISC 360-10 had a second, larger column for sheared edges (SHEARED_2010 below, from memory).
const INCH: readonly (readonly [number, number])[] = [
  [0.5, 0.75],
  [0.625, 0.875],
  [0.75, 1],
  [0.875, 1.125],
  [1, 1.25],
  [1.125, 1.5],
  [1.25, 1.625],
];

// AISC 360-16 Table J3.4M, mm: published.
const METRIC: readonly (readonly [number, number])[] = [
  [16, 22],
  [20, 26],
  [22, 28],
  [24, 30],
  [27, 34],
  [30, 38],
  [36, 46],
];

// AISC 360-10 Table J3.4 / J3.4M, column "at sheared edges" (from memory); over the last row 1.75 d.
const SHEARED_2010: Record<UnitSystem, readonly (readonly [number, number])[]> = {
  in: [
    [0.5, 0.875],
    [0.625, 1.125],
    [0.75, 1.25],
    [0.875, 1.5],
    [1, 1.75],
    [1.125, 2],
    [1.25, 2.25],
  ],
  mm: [
    [16, 28],
    [20, 34],
    [22, 38],
    [24, 42],
    [27, 48],
    [30, 52],
    [36, 64],
  ],
};

const SAME_SIZE = 1e-6;

/**
 * Minimum edge distance from the centre of a standard hole to the edge of the connected part
 * (AISC 360 Table J3.4 / J3.4M), or `undefined` for a bolt size the table does not list.
 *
 * @param boltDiameter - nominal bolt diameter, in or mm
 * @param units - unit system of the diameter
 * @param edge - `rolled` (AISC 360-16/-22, and 360-10 at rolled or thermally cut edges) or
 *   `sheared-2010` (AISC 360-10 at sheared edges, from memory)
 * @returns the minimum edge distance in the same unit
 * @example
 * minimumEdgeDistance(0.75, 'in') // → 1
 * minimumEdgeDistance(1.5, 'in')  // → 1.875 (over 1-1/4 in: 1.25d)
 * minimumEdgeDistance(20, 'mm')   // → 26
 * minimumEdgeDistance(0.75, 'in', 'sheared-2010') // → 1.25
 */
export function minimumEdgeDistance(
  boltDiameter: number,
  units: UnitSystem,
  edge: 'rolled' | 'sheared-2010' = 'rolled',
): number | undefined {
  const table = edge === 'sheared-2010' ? SHEARED_2010[units] : units === 'in' ? INCH : METRIC;
  const row = table.find(([d]) => Math.abs(d - boltDiameter) < SAME_SIZE);
  if (row) return row[1];
  const last = table[table.length - 1];
  // "Over 1-1/4 in" / "over M36": 1.25d (2010 sheared edges: 1.75d).
  if (last && boltDiameter > last[0] + SAME_SIZE)
    return (edge === 'sheared-2010' ? 1.75 : 1.25) * boltDiameter;
  return undefined;
}
