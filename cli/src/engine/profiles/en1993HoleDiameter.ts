import { ProfileError } from './profileError.js';

/**
 * Hole diameter d0 for a bolt in a normal round clearance hole, EN 1090-2 (as conformance/SOURCES.md restates
 * it from a national code text): clearance 1 mm for M12 and M14, 2 mm for M16 to M24, 3 mm for M27 and
 * larger. Oversized and slotted holes are not offered: their clearances were not found in a source
 * we could cite, so the calc file must give their dimensions explicitly.
 *
 * @param boltDiameter - nominal bolt diameter d, mm (20 for M20), ≥ 12
 * @returns d0, mm
 * @throws ProfileError for bolts below M12
 * @example
 * en1993HoleDiameter(20) // → 22 (SBE Part 8 WE3: M20 in d0 = 22 mm)
 * en1993HoleDiameter(12) // → 13
 * en1993HoleDiameter(30) // → 33
 */
export function en1993HoleDiameter(boltDiameter: number): number {
  if (!(Number.isFinite(boltDiameter) && boltDiameter >= 12)) {
    throw new ProfileError(`no EN 1090-2 normal clearance for an M${boltDiameter} bolt (M12 and larger)`);
  }
  const clearance = boltDiameter <= 14 ? 1 : boltDiameter <= 24 ? 2 : 3;
  return boltDiameter + clearance;
}
