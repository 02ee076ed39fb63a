import type { LoadDirection } from '../types.js';
import { SectionError } from './sectionError.js';
import { sectionChains } from './sectionChains.js';
import type { SectionDirectionResult, SectionLayout } from './types.js';

/**
 * The net section of an unfolded section for each load direction asked for: the k least admissible
 * chains by net area ({@link sectionChains}) and An = min(least chain, Ag) (cli/docs/method.md §3–4).
 *
 * @param layout - the unfolded section with its holes (see {@link unfold})
 * @param directions - one or both of `-x`, `+x`, no repeats
 * @param k - least chains kept per direction
 * @returns one result per direction, in the order asked
 * @throws SectionError ('invalid-argument') when the directions are empty or repeated
 * @example
 * // Quimby Example 3 (conformance/SOURCES.md R5): W14x68, four flange holes and two web holes
 * sectionDirections(unfold(wShape(14.0, 10.0, 0.72, 0.415), holes, { tabulatedAg: 20.0 }), ['-x'], 10)[0]?.An
 * // → 16.8646
 */
export function sectionDirections(
  layout: SectionLayout,
  directions: readonly LoadDirection[],
  k: number,
): SectionDirectionResult[] {
  if (directions.length === 0 || new Set(directions).size !== directions.length) {
    throw new SectionError('invalid-argument', 'directions must be one or both of -x, +x without repeats');
  }
  return directions.map((direction) => {
    const leastChains = sectionChains(layout, direction, { k });
    const governing = leastChains[0] ?? null;
    return { direction, governing, leastChains, An: Math.min(governing?.netArea ?? layout.Ag, layout.Ag) };
  });
}
