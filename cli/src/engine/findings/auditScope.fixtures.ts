// A member's audit scope shared by the findings' tests. Not part of the package build.
import type { UnitSystem } from '../types.js';
import { DEFAULT_TOLERANCE } from './withinTolerance.js';
import type { AuditScope } from './types.js';

/** Member `memberId` at `/members/0`, the default 0.5 % tolerance. */
export const scopeOf = (memberId: string, units: UnitSystem = 'in'): AuditScope => ({
  memberId,
  pointer: '/members/0',
  units,
  tolerance: DEFAULT_TOLERANCE,
});
