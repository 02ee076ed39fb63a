import { EngineError } from '../engineError.js';
import { holeTableInch } from './holeTableInch.js';
import { holeTableMetric } from './holeTableMetric.js';
import type { CodeProfile, HoleInput, HoleWidth } from '../types.js';

/** AISC 360 B4.3b: damage allowance added to the nominal hole dimension for net area. */
function damageAllowance(profile: CodeProfile): number {
  return profile.units === 'in' ? 1 / 16 : 2;
}

function describeBolt(d: number, profile: CodeProfile): string {
  return profile.units === 'in' ? `${d} in` : `M${d} (${d} mm)`;
}

/**
 * Width a hole deducts in net area: the nominal hole dimension across the load, from AISC 360
 * Table J3.3 (in) or J3.3M (mm) for the edition in `profile.standard` or given explicitly, plus the
 * B4.3b damage allowance (1/16 in, 2 mm), which is added to explicit dimensions too. A slot running
 * along the load deducts its short dimension; one running across the load deducts its long one.
 *
 * @param hole - the hole: bolt diameter and type, or an explicit dimension
 * @param profile - code edition and unit system
 * @returns nominal dimensions, the allowance and the deducted width
 * @throws EngineError when the bolt size has no row in the table, the hole has neither bolt nor
 *   dimension, or a slot has no orientation
 * @example
 * // AISC Design Examples v13.0 D.9: 3/4 in bolt, standard hole 13/16 + 1/16 = 0.875 in
 * holeWidth({ id: 'A1', x: 0, y: 2, boltDiameter: 0.75, type: 'standard' }, profile).deducted // → 0.875
 * // 3/4 in bolt, short slot 13/16 × 1 running across the load: 1 + 1/16
 * holeWidth({ id: 'B1', x: 0, y: 5, boltDiameter: 0.75, type: 'short-slotted', slot: 'across' }, profile)
 *   .deducted // → 1.0625
 */
export function holeWidth(hole: HoleInput, profile: CodeProfile): HoleWidth {
  const allowance = damageAllowance(profile);
  if (hole.dimension) {
    const { across, along } = hole.dimension;
    if (!(across > 0) || !(along > 0)) {
      throw new EngineError('invalid-argument', `hole ${hole.id}: explicit dimensions must be positive`);
    }
    return {
      holeId: hole.id,
      nominalAcross: across,
      nominalAlong: along,
      allowance,
      deducted: across + allowance,
      source: 'explicit',
    };
  }
  const d = hole.boltDiameter;
  if (d === undefined) {
    throw new EngineError('missing-bolt-size', `hole ${hole.id} has neither a bolt diameter nor a dimension`);
  }
  const row = profile.units === 'in' ? holeTableInch(d, profile.standard) : holeTableMetric(d);
  if (!row) {
    const table = profile.units === 'in' ? 'J3.3' : 'J3.3M';
    throw new EngineError(
      'unknown-bolt-size',
      `hole ${hole.id}: ${profile.standard} Table ${table} has no hole for a ${describeBolt(d, profile)} bolt`,
    );
  }
  let across: number;
  let along: number;
  if (hole.type === 'standard' || hole.type === 'oversized') {
    across = along = hole.type === 'standard' ? row.standard : row.oversized;
  } else {
    if (!hole.slot) {
      throw new EngineError(
        'missing-slot-orientation',
        `hole ${hole.id}: a ${hole.type} hole needs slot "along" or "across"`,
      );
    }
    const [short, long] = hole.type === 'short-slotted' ? row.shortSlot : row.longSlot;
    across = hole.slot === 'along' ? short : long;
    along = hole.slot === 'along' ? long : short;
  }
  return {
    holeId: hole.id,
    nominalAcross: across,
    nominalAlong: along,
    allowance,
    deducted: across + allowance,
    source: 'table',
  };
}
