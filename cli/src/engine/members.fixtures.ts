// Members shared by the engine's tests. Not part of the package build (tsconfig.build.json).
import type { HoleInput, MemberInput } from './types.js';

/** A standard hole for a bolt of diameter `d` (3/4 in unless given) at (x, y). */
export const bolt = (id: string, x: number, y: number, d = 0.75): HoleInput => ({
  id,
  x,
  y,
  boltDiameter: d,
  type: 'standard',
});

/**
 * AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1): PL 14 × 1/2 in, A36, four 3/4 in
 * bolts; gauge lines at y = 2, 5, 9, 12 in (derived from the published path terms and symmetry), the
 * two inner holes 2.5 in further along. Published: chain A–B–C–D 11.5 in, An 5.75 in².
 */
export const d9Member: MemberInput = {
  id: 'D9',
  kind: 'plate',
  width: 14,
  thickness: 0.5,
  material: { grade: 'A36', Fy: 36, Fu: 58 },
  directions: ['-x', '+x'],
  holes: [bolt('A', 0, 2), bolt('B', 2.5, 5), bolt('C', 2.5, 9), bolt('D', 0, 12)],
};
