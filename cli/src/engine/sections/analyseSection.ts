import { sectionDirections } from './sectionDirections.js';
import { sectionGrossArea } from './sectionGrossArea.js';
import { unfold } from './unfold.js';
import type { LoadDirection } from '../types.js';
import type { Section, SectionHoleInput, SectionResult } from './types.js';

/** Options of {@link analyseSection}. */
export interface AnalyseSectionOptions {
  /** Directions to report, no repeats (default both). */
  readonly directions?: readonly LoadDirection[];
  /** Least chains kept per direction (default 10). */
  readonly k?: number;
  /** Tabulated gross area (all pieces); wins over the elements' sum, the difference is reported. */
  readonly tabulatedAg?: number;
}

/**
 * Net section of a member made of flat elements: unfolds it, finds the k least admissible chains per
 * load direction by net area, and takes An = min(least chain, Ag) per direction (cli/docs/method.md §3–4) and
 * over directions. Shear lag, strengths and block shear are separate steps (../net-area/shear-lag,
 * ../profiles, ../strength/block-shear).
 *
 * @param section - the section
 * @param holes - the holes with gauges as detailers give them and their deducted widths
 * @param options - directions, k, tabulated Ag
 * @returns gross area (both values), layout, per-direction chains and the governing An
 * @example
 * // Quimby Example 3 (R5): W14x68, four flange holes and two web holes
 * analyseSection(wShape(14.0, 10.0, 0.72, 0.415), holes, { tabulatedAg: 20.0 }).An // → 16.8646
 */
export function analyseSection(
  section: Section,
  holes: readonly SectionHoleInput[],
  options: AnalyseSectionOptions = {},
): SectionResult {
  const layout = unfold(section, holes, options);
  const grossArea = sectionGrossArea(section, options.tabulatedAg);
  const results = sectionDirections(layout, options.directions ?? ['-x', '+x'], options.k ?? 10);
  let best = results[0]!;
  for (const r of results) if (r.An < best.An) best = r;
  return { grossArea, layout, directions: results, An: best.An, governingDirection: best.direction };
}
