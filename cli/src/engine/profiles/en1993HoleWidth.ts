import { en1993HoleDiameter } from './en1993HoleDiameter.js';
import { ProfileError } from './profileError.js';
import type { ProfileHoleInput, ProfileHoleWidth } from './types.js';

/**
 * Width EN 1993-1-1 deducts for a hole: the hole diameter d0 itself, with no damage allowance
 * (6.2.2.2; cli/docs/method.md §2). d0 from the bolt by EN 1090-2 normal clearance, or as given.
 *
 * @param hole - bolt diameter or an explicit hole diameter
 * @returns d0 deducted, allowance 0
 * @throws ProfileError when neither is given
 * @example
 * en1993HoleWidth({ boltDiameter: 20 }).deducted // → 22
 * en1993HoleWidth({ holeDiameter: 26 }).deducted // → 26
 */
export function en1993HoleWidth(hole: ProfileHoleInput): ProfileHoleWidth {
  if (hole.holeDiameter !== undefined) {
    if (!(hole.holeDiameter > 0))
      throw new ProfileError(`hole diameter must be positive, got ${hole.holeDiameter}`);
    return {
      nominal: hole.holeDiameter,
      allowance: 0,
      deducted: hole.holeDiameter,
      source: 'explicit',
      clause: 'EN 1993-1-1 6.2.2.2',
    };
  }
  if (hole.boltDiameter === undefined)
    throw new ProfileError('a hole needs a bolt diameter or a hole diameter');
  const d0 = en1993HoleDiameter(hole.boltDiameter);
  return {
    nominal: d0,
    allowance: 0,
    deducted: d0,
    source: 'table',
    clause: 'EN 1993-1-1 6.2.2.2; EN 1090-2 normal clearance',
  };
}
