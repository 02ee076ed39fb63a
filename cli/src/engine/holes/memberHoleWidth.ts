import { EngineError } from '../engineError.js';
import { holeWidth } from './holeWidth.js';
import { ProfileError } from '../profiles/profileError.js';
import { tensionProfileOf } from '../strength/tensionProfileOf.js';
import type { CodeProfile, HoleInput, HoleWidth } from '../types.js';

/**
 * Width a hole deducts under the file's code: AISC 360 through {@link holeWidth} (Table J3.3 plus
 * 1/16 in or 2 mm, B4.3b); EN 1993-1-1 the hole diameter d0 itself (EN 1090-2 normal clearance, no
 * allowance); CSA S16 the hole plus 2 mm (12.3.2). Under EN and CSA an explicit size is the hole
 * diameter across the load; slotted holes need an explicit size there.
 *
 * @param hole - the hole
 * @param profile - the file's code profile
 * @returns the width deducted and how it was found
 * @throws EngineError when the bolt size is not in the code's table or a slotted hole has no size under EN or CSA
 * @example
 * memberHoleWidth({ id: 'A', x: 0, y: 40, boltDiameter: 20, type: 'standard' },
 *   { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' }).deducted // → 22
 */
export function memberHoleWidth(hole: HoleInput, profile: CodeProfile): HoleWidth {
  const tension = tensionProfileOf(profile);
  if (!tension) return holeWidth(hole, profile);
  if (hole.type !== 'standard' && !hole.dimension) {
    throw new EngineError(
      'unknown-bolt-size',
      `hole ${hole.id}: ${profile.standard} ${hole.type} holes need an explicit size`,
    );
  }
  try {
    const w = tension.holeWidth({
      ...(hole.boltDiameter !== undefined ? { boltDiameter: hole.boltDiameter } : {}),
      ...(hole.dimension ? { holeDiameter: hole.dimension.across } : {}),
    });
    return {
      holeId: hole.id,
      nominalAcross: w.nominal,
      nominalAlong: hole.dimension?.along ?? w.nominal,
      allowance: w.allowance,
      deducted: w.deducted,
      source: w.source,
    };
  } catch (err) {
    if (!(err instanceof ProfileError)) throw err;
    throw new EngineError('unknown-bolt-size', `hole ${hole.id}: ${err.message.replace(/^[^:]*: /, '')}`);
  }
}
