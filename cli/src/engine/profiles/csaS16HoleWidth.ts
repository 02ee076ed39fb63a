import { ProfileError } from './profileError.js';
import type { ProfileHoleInput, ProfileHoleWidth } from './types.js';

/**
 * Width CSA S16 deducts for a hole: the hole diameter plus 2 mm (12.3.2; published in N. Holtz's
 * CSA S16 course notes, conformance/SOURCES.md R3: 22 mm punched holes deduct 24 mm). Without an explicit hole
 * diameter the hole is taken as bolt + 2 mm — from memory of S16's standard hole, confirm before use.
 *
 * @param hole - an explicit hole diameter, or a bolt diameter
 * @returns nominal hole, 2 mm allowance, width deducted
 * @throws ProfileError when neither is given
 * @example
 * csaS16HoleWidth({ holeDiameter: 22 }).deducted // → 24 (R3: 3/4 in bolts in 22 mm punched holes)
 * csaS16HoleWidth({ boltDiameter: 20 }).deducted // → 24 (memory: hole d + 2 mm)
 */
export function csaS16HoleWidth(hole: ProfileHoleInput): ProfileHoleWidth {
  if (hole.holeDiameter !== undefined) {
    if (!(hole.holeDiameter > 0))
      throw new ProfileError(`hole diameter must be positive, got ${hole.holeDiameter}`);
    return {
      nominal: hole.holeDiameter,
      allowance: 2,
      deducted: hole.holeDiameter + 2,
      source: 'explicit',
      clause: 'CSA S16 12.3.2',
    };
  }
  if (hole.boltDiameter === undefined || !(hole.boltDiameter > 0)) {
    throw new ProfileError('a hole needs a bolt diameter or a hole diameter');
  }
  const nominal = hole.boltDiameter + 2;
  return {
    nominal,
    allowance: 2,
    deducted: nominal + 2,
    source: 'table',
    clause: 'CSA S16 12.3.2 (hole d + 2 mm from memory)',
  };
}
