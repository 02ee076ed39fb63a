// Hole layouts shared by the engine's tests. Not part of the package build (tsconfig.build.json).
import type { HoleLayout } from '../types.js';

/**
 * AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1): PL 14 × 1/2 in, 3/4 in bolts, hole width
 * for net area 0.875 in. Gauge lines at y = 2, 5, 9, 12 in (derived from the published path terms and
 * symmetry); the two inner holes 2.5 in further along than the outer ones.
 */
export const d9: HoleLayout = {
  width: 14,
  thickness: 0.5,
  holes: [
    { id: 'A', index: 0, x: 0, y: 2, deducted: 0.875 },
    { id: 'B', index: 1, x: 2.5, y: 5, deducted: 0.875 },
    { id: 'C', index: 2, x: 2.5, y: 9, deducted: 0.875 },
    { id: 'D', index: 3, x: 0, y: 12, deducted: 0.875 },
  ],
};
