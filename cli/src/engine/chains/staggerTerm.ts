import { EngineError } from '../engineError.js';

/**
 * The stagger term of one gauge space of a chain (AISC 360 B4.3b): s²/(4g).
 *
 * @param s - stagger (pitch offset) along the load between the two holes, ≥ 0 (the sign is ignored)
 * @param g - gauge across the load between the two holes, > 0
 * @returns s²/(4g), in the unit of the inputs
 * @throws EngineError when g is not positive
 * @example
 * staggerTerm(2.5, 3) // → 0.5208333 (AISC Design Examples v13.0 D.9: 2.5²/(4·3))
 * staggerTerm(3, 3)   // → 0.75
 */
export function staggerTerm(s: number, g: number): number {
  if (!(g > 0)) throw new EngineError('invalid-argument', `staggerTerm: gauge must be positive, got ${g}`);
  return (s * s) / (4 * g);
}
