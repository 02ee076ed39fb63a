import { EngineError } from '../engineError.js';
import type { HoleLayout } from '../types.js';

/**
 * Entry check of the chain searches: a positive finite width and thickness, finite hole positions and
 * non-negative deducted widths. The loader rejects such input first; this keeps a direct caller from
 * getting NaN results.
 *
 * @param layout - the holes and plate
 * @param caller - the function name, for the message
 * @throws EngineError ('invalid-argument') naming the first bad value
 * @example
 * assertLayout({ width: 0, thickness: 0.5, holes: [] }, 'leastChains')
 * // throws 'ligament/engine: leastChains: width must be a positive number, got 0'
 */
export function assertLayout(layout: HoleLayout, caller: string): void {
  const positive = (v: number): boolean => Number.isFinite(v) && v > 0;
  if (!positive(layout.width)) {
    throw new EngineError(
      'invalid-argument',
      `${caller}: width must be a positive number, got ${layout.width}`,
    );
  }
  if (!positive(layout.thickness)) {
    throw new EngineError(
      'invalid-argument',
      `${caller}: thickness must be a positive number, got ${layout.thickness}`,
    );
  }
  for (const h of layout.holes) {
    if (!Number.isFinite(h.x) || !Number.isFinite(h.y)) {
      throw new EngineError(
        'invalid-argument',
        `${caller}: hole ${h.id} has a position that is not a finite number`,
      );
    }
    if (!Number.isFinite(h.deducted) || h.deducted < 0) {
      throw new EngineError('invalid-argument', `${caller}: hole ${h.id} deducts ${h.deducted}, not a width`);
    }
  }
}
