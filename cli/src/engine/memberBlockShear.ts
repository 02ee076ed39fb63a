import { blockShear, type BlockShearCode } from './block-shear/blockShear.js';
import { BlockShearError } from './block-shear/blockShearError.js';
import { sectionBlockLayouts } from './block-shear/sectionBlockLayouts.js';
import type { BlockShearLayout } from './block-shear/types.js';
import type { SectionLayout } from './sections/types.js';
import type { CodeProfile, HoleWidth, LoadDirection, MemberBlockShear, MemberInput } from './types.js';

function code(member: MemberInput, profile: CodeProfile): BlockShearCode {
  const { Fy, Fu } = member.material;
  const Ubs = member.blockShear?.Ubs ?? 1;
  switch (profile.standard) {
    case 'EN 1993-1-1':
      return {
        standard: 'EN 1993-1-8',
        fy: Fy,
        fu: Fu,
        loading: Ubs === 1 ? 'concentric' : 'eccentric',
        gammaM0: profile.nationalAnnex?.gammaM0 ?? 1.0,
        gammaM2: profile.nationalAnnex?.gammaM2 ?? 1.25,
      };
    case 'CSA S16-19':
      return { standard: 'CSA S16', Fy, Fu, Ut: member.blockShear?.Ut ?? 1.0 };
    default:
      return { standard: 'AISC 360', Fy, Fu, Ubs, method: profile.method, units: profile.units };
  }
}

/**
 * Block shear of the bolt group at the member's loaded end (AISC 360 J4.3, EN 1993-1-8 3.10.2, CSA
 * S16 13.11): for each load direction the loaded end lies `endDistance` beyond the outermost bolt
 * row; each connected element (a plate's own width, a section's elements, a flange split at its web)
 * proposes its outlines and keeps the weakest; the parts tear out together, so their areas and
 * strengths add. The direction with the least sum governs.
 *
 * @param member - the member with its `blockShear` input
 * @param profile - the file's code profile
 * @param holeWidths - deducted widths, in hole order
 * @param directions - directions to check
 * @param layout - the unfolded section (section members)
 * @returns the governing tear-out, or undefined without block-shear input or when no outline can form
 * @example
 * // R6 2L6x6x5/8, end distance 2.125 in: Agv 32.66, Anv 22.04, Agt 4.69, Ant 4.07 in², φRn 706 kips
 * memberBlockShear(member, aisc, widths, ['-x'], layout)?.available // → 706.3
 */
export function memberBlockShear(
  member: MemberInput,
  profile: CodeProfile,
  holeWidths: readonly HoleWidth[],
  directions: readonly LoadDirection[],
  layout?: SectionLayout,
): MemberBlockShear | undefined {
  const spec = member.blockShear;
  if (!spec || member.holes.length === 0) return undefined;
  const elements = layout ? (spec.elements ?? [...new Set(layout.holes.map((h) => h.element))]) : ['plate'];
  const xs = layout
    ? layout.holes.filter((h) => elements.includes(h.element)).map((h) => h.x)
    : member.holes.map((h) => h.x);
  if (xs.length === 0) return undefined;
  const form = code(member, profile);
  let best: MemberBlockShear | undefined;
  for (const direction of directions) {
    const endX = direction === '-x' ? Math.min(...xs) - spec.endDistance : Math.max(...xs) + spec.endDistance;
    let parts: { element: string; layout: BlockShearLayout }[];
    try {
      parts = layout
        ? elements.flatMap((e) =>
            sectionBlockLayouts(layout, e, direction, endX).map((l) => ({ element: e, layout: l })),
          )
        : [
            {
              element: 'plate',
              layout: {
                width: member.width,
                thickness: member.thickness,
                holes: member.holes.map((h, i) => ({
                  id: h.id,
                  x: h.x,
                  y: h.y,
                  deducted: holeWidths[i]!.deducted,
                })),
                direction,
                endX,
                freeEdges: { low: true, high: true },
              },
            },
          ];
    } catch (err) {
      if (err instanceof BlockShearError) return undefined;
      throw err;
    }
    const sum = { Agv: 0, Anv: 0, Agt: 0, Ant: 0, nominal: 0, available: 0 };
    const out: MemberBlockShear['parts'][number][] = [];
    let factor = 0;
    let clause = '';
    let complete = true;
    for (const part of parts) {
      const g = blockShear(part.layout, form).governing;
      if (!g) {
        complete = false;
        break;
      }
      sum.Agv += g.Agv;
      sum.Anv += g.Anv;
      sum.Agt += g.Agt;
      sum.Ant += g.Ant;
      sum.nominal += g.strength.nominal;
      sum.available += g.strength.available;
      factor = g.strength.factor;
      clause = g.strength.clause;
      out.push({
        element: part.element,
        kind: g.kind,
        tensionHoles: g.tensionHoles,
        staggerSum: g.staggerSum,
        source: g.source,
        available: g.strength.available,
      });
    }
    if (!complete || out.length === 0) continue;
    const candidate: MemberBlockShear = {
      direction,
      ...sum,
      factor,
      clause,
      parts: out,
      projectDefined: out.some((p) => p.source === 'project-defined'),
    };
    if (!best || candidate.available < best.available) best = candidate;
  }
  return best;
}
