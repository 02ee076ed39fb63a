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

/** A hole in leg a of an angle, `gauge` from the heel, for a 3/4 in bolt. */
export const legHole = (id: string, x: number, gauge = 2.5): HoleInput => ({
  id,
  x,
  y: Number.NaN,
  element: 'leg-a',
  gauge,
  boltDiameter: 0.75,
  type: 'standard',
});

/**
 * L4x4x3/8 brace of the fictional Harbour Lantern example (schema/examples/lantern-brace-angle.json):
 * four 3/4 in bolts at 3 in in one leg, 2.5 in from the heel, Ag 2.86 in² tabulated, x̄ 1.13 in, end
 * distance 1.5 in. By hand (common practice): block shear φRn 81.12 kips governs.
 */
export const braceMember: MemberInput = {
  id: 'B',
  kind: 'angle',
  width: 7.625,
  thickness: 0.375,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  section: { shape: 'angle', a: 4, b: 4, t: 0.375, tabulatedAg: 2.86 },
  holes: [legHole('A1', 0), legHole('A2', 3), legHole('A3', 6), legHole('A4', 9)],
  shearLag: { connected: 'leg', length: 9, xbar: 1.13, fastenersPerLine: 4 },
  blockShear: { endDistance: 1.5 },
};
