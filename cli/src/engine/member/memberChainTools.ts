import { chainDefect } from '../chains/chainDefect.js';
import { chainOf } from '../chains/chainOf.js';
import { chainRejection } from '../chains/chainRejection.js';
import { sectionChainAsChain } from '../net-area/sectionChainAsChain.js';
import { SectionError } from '../sections/sectionError.js';
import { sectionChain } from '../sections/sectionChain.js';
import { sectionRejection } from '../sections/sectionRejection.js';
import type { Chain, ChainDefect, ChainRejection, LoadDirection, MemberModel } from '../types.js';

/** What the claims comparison needs to judge a claimed chain, for plates and sections alike. */
export interface MemberChainTools {
  /** Why the ids are not a chain, or null. */
  defect(ids: readonly string[]): ChainDefect | null;
  /** The chain (ids known to form one). */
  of(ids: readonly string[]): Chain;
  /** Why the chain cannot form under the full load from a direction, or null. */
  rejection(chain: Chain, direction: LoadDirection): ChainRejection | null;
}

/**
 * Chain tools for a member: the plate's (chainDefect, chainOf, chainRejection on its hole layout), or
 * for a section member the section's (sectionChain, sectionRejection on its unfolded section), the
 * section chain given in the plate shape ({@link sectionChainAsChain}).
 *
 * @param model - the member model
 * @returns the tools
 * @example
 * // AISC Design Examples v13.0 D.9 (conformance/SOURCES.md R1): 14 − 4 · 0.875 + 2 · 2.5²/(4 · 3)
 * memberChainTools(memberModel(d9, aisc)).of(['A', 'B', 'C', 'D']).netWidth // → 11.5417
 */
export function memberChainTools(model: MemberModel): MemberChainTools {
  if (!model.unfolded) {
    const layout = model.layout;
    return {
      defect: (ids) => chainDefect(layout, ids),
      of: (ids) => chainOf(layout, ids),
      rejection: (chain, d) => chainRejection(chain, layout, d),
    };
  }
  const layout = model.unfolded;
  const index = new Map(layout.holes.map((h, i) => [h.id, i] as const));
  const t = model.input.thickness;
  const pieces = layout.section.pieces;
  const positions = (ids: readonly string[]) => ids.map((id) => index.get(id)!);
  return {
    defect: (ids) => {
      if (ids.length === 0) return { reason: 'empty', position: 0, message: 'the chain names no holes' };
      const seen = new Set<string>();
      for (let i = 0; i < ids.length; i++) {
        const id = ids[i]!;
        if (!index.has(id))
          return { reason: 'unknown-hole', position: i, holeId: id, message: `no hole ${id} in the member` };
        if (seen.has(id))
          return { reason: 'repeated-hole', position: i, holeId: id, message: `hole ${id} appears twice` };
        seen.add(id);
      }
      try {
        sectionChain(layout, positions(ids));
      } catch (err) {
        if (!(err instanceof SectionError)) throw err;
        return { reason: 'same-gauge-line', position: 0, message: err.message.replace(/^[^:]*: /, '') };
      }
      return null;
    },
    of: (ids) => sectionChainAsChain(sectionChain(layout, positions(ids)), t, pieces),
    rejection: (chain, d) => sectionRejection(layout, positions(chain.holes), d),
  };
}
