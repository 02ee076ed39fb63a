import { EngineError } from '../engineError.js';
import { leastChains } from '../chains/leastChains.js';
import { equalShareChain } from '../chains/equalShareChain.js';
import { sectionDirections } from '../sections/sectionDirections.js';
import type { DirectionResult, LoadDirection, MemberGrossArea, MemberModel } from '../types.js';
import { sectionChainAsChain } from './sectionChainAsChain.js';

/** The net section of a member over the directions asked for. */
export interface NetSections {
  /** Gross area: width · t for a plate, the section's (tabulated when given) for a rolled shape. */
  readonly Ag: number;
  /** Rolled shapes: Ag from the elements and as tabulated. */
  readonly grossArea?: MemberGrossArea;
  readonly directions: readonly DirectionResult[];
  /** The least An over the directions. */
  readonly An: number;
  /** The direction whose An governs (the first asked for on a tie). */
  readonly governingDirection: LoadDirection;
}

/**
 * Net section of a member per load direction (cli/docs/method.md §3–4): the least chain that can form
 * under the full load, its k least companions and An = min(governing net area, Ag). A plate is
 * searched on its hole layout ({@link leastChains}) with the equal-share rule ({@link equalShareChain});
 * a rolled shape on its unfolded section ({@link sectionDirections}), its chains given in the plate
 * shape ({@link sectionChainAsChain}), with no equal-share rule.
 *
 * @param model - the member model
 * @param directions - the directions to report
 * @param k - least chains kept per direction
 * @returns Ag, the per-direction results, the least An and its direction
 * @throws EngineError when a direction's least chain leaves a net area ≤ 0 (the loader reports that
 *   as the rule net-area-positive with the file and pointer)
 * @example
 * // AISC Design Examples v13.0 D.9 (conformance/SOURCES.md R1): A–B–C–D governs, 11.54 × 1/2
 * netSections(memberModel(d9Member, aisc), ['-x'], 10).An // → 5.7708 (published 5.75 in²)
 */
export function netSections(
  model: MemberModel,
  directions: readonly LoadDirection[],
  k: number,
): NetSections {
  const member = model.input;
  let Ag: number;
  let results: DirectionResult[];
  let grossArea: MemberGrossArea | undefined;
  if (model.unfolded) {
    grossArea = model.grossArea;
    Ag = grossArea.used;
    const pieces = model.unfolded.section.pieces;
    results = sectionDirections(model.unfolded, directions, k).map((d) => ({
      direction: d.direction,
      governing: d.governing ? sectionChainAsChain(d.governing, member.thickness, pieces) : null,
      leastChains: d.leastChains.map((c) => sectionChainAsChain(c, member.thickness, pieces)),
      An: d.An,
      share: null,
    }));
  } else {
    const layout = model.layout;
    Ag = member.width * member.thickness;
    results = directions.map((direction) => {
      const least = leastChains(layout, direction, k);
      const governing = least[0] ?? null;
      return {
        direction,
        governing,
        leastChains: least,
        An: governing ? Math.min(governing.netArea, Ag) : Ag,
        share: equalShareChain(layout, direction),
      };
    });
  }
  let governingDirection = directions[0] ?? '-x';
  let An = Ag;
  for (const d of results) {
    if (d.An < An) {
      An = d.An;
      governingDirection = d.direction;
    }
  }
  // A net section ≤ 0 is an input error (the loader's rule net-area-positive), never a negative strength.
  for (const d of results) {
    if (d.An > 0) continue;
    const chain = d.governing ? `chain ${d.governing.holes.join('-')}` : 'the section';
    throw new EngineError(
      'invalid-argument',
      `member ${member.id}: ${chain} loaded from ${d.direction} leaves a net area of ${d.An}, not positive (rule net-area-positive)`,
    );
  }
  return { Ag, ...(grossArea ? { grossArea } : {}), directions: results, An, governingDirection };
}
