import { analyseSection } from '../sections/analyseSection.js';
import { chainDefect } from '../chains/chainDefect.js';
import { chainOf } from '../chains/chainOf.js';
import { chainRejection } from '../chains/chainRejection.js';
import { memberLayout } from './memberLayout.js';
import { memberSection } from './memberSection.js';
import { SectionError } from '../sections/sectionError.js';
import { sectionChain } from '../sections/sectionChain.js';
import { sectionRejection } from '../sections/sectionRejection.js';
import type { SectionLayout } from '../sections/types.js';
import type {
  Chain,
  ChainDefect,
  ChainRejection,
  CodeProfile,
  HoleWidth,
  LoadDirection,
  MemberInput,
} from '../types.js';

/** What the claims comparison needs to judge a claimed chain, for plates and sections alike. */
export interface MemberChainTools {
  /** Why the ids are not a chain, or null. */
  defect(ids: readonly string[]): ChainDefect | null;
  /** The chain (ids known to form one). */
  of(ids: readonly string[]): Chain;
  /** Why the chain cannot form under the full load from a direction, or null. */
  rejection(chain: Chain, direction: LoadDirection): ChainRejection | null;
}

/** The unfolded section of a section member (no chain search). */
export function memberUnfolded(member: MemberInput, holeWidths: readonly HoleWidth[]): SectionLayout {
  const spec = member.section!;
  return analyseSection(
    memberSection(spec),
    member.holes.map((h, i) => ({
      id: h.id,
      element: h.element ?? '',
      x: h.x,
      gauge: h.gauge ?? 0,
      deducted: holeWidths[i]!.deducted,
    })),
    {
      k: 1,
      directions: ['-x'],
      ...(spec.tabulatedAg !== undefined ? { tabulatedAg: spec.tabulatedAg } : {}),
    },
  ).layout;
}

/**
 * Chain tools for a member: the plate's (chainDefect, chainOf, chainRejection on the hole layout),
 * or for a section member the section's (sectionChain, sectionRejection on the unfolded section), the
 * section chain given in the plate shape (net width at the member's thickness, see analyseMember).
 *
 * @param member - the member
 * @param profile - the file's code profile
 * @param holeWidths - deducted widths in hole order
 * @returns the tools
 * @example
 * memberChainTools(d9, aisc, widths).of(['A', 'B', 'C', 'D']).netWidth // → 11.5417
 */
export function memberChainTools(
  member: MemberInput,
  profile: CodeProfile,
  holeWidths: readonly HoleWidth[],
): MemberChainTools {
  if (!member.section) {
    const layout = memberLayout(member, profile, holeWidths);
    return {
      defect: (ids) => chainDefect(layout, ids),
      of: (ids) => chainOf(layout, ids),
      rejection: (chain, d) => chainRejection(chain, layout, d),
    };
  }
  const layout = memberUnfolded(member, holeWidths);
  const index = new Map(layout.holes.map((h, i) => [h.id, i] as const));
  const t = member.thickness;
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
    of: (ids) => {
      const c = sectionChain(layout, positions(ids));
      return {
        holes: c.holes,
        legs: c.legs.map((l) => ({ from: l.from, to: l.to, s: l.s, g: l.g, term: l.term })),
        deducted: c.deductedArea / (pieces * t),
        staggerSum: c.legs.reduce((s, l) => s + l.term, 0),
        netWidth: c.netArea / (pieces * t),
        netArea: c.netArea,
      };
    },
    rejection: (chain, d) => sectionRejection(layout, positions(chain.holes), d),
  };
}
