import { blockShear, type BlockShearCode } from './block-shear/blockShear.js';
import { BlockShearError } from './block-shear/blockShearError.js';
import { sectionBlockLayout } from './block-shear/sectionBlockLayouts.js';
import { designMethodOf } from './designMethodOf.js';
import type { BlockShearCase, BlockShearLayout } from './block-shear/types.js';
import type {
  CodeProfile,
  LoadDirection,
  MemberBlockOutline,
  MemberBlockShear,
  MemberInput,
  MemberModel,
} from '../types.js';

/** Outlines kept per result, least first (for comparing a claim with the outline it describes). */
const KEPT = 10;

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
      return { standard: 'CSA S16', Fy, Fu, Ut: member.blockShear?.Ut ?? 1.0, edition: 'S16-19' };
    default:
      return {
        standard: 'AISC 360',
        Fy,
        Fu,
        Ubs,
        method: designMethodOf(profile) === 'ASD' ? 'ASD' : 'LRFD',
        units: profile.units,
      };
  }
}

function outlineOf(c: BlockShearCase, direction: LoadDirection): MemberBlockOutline {
  return {
    direction,
    kind: c.kind,
    description: c.description,
    Agv: c.Agv,
    Anv: c.Anv,
    Agt: c.Agt,
    Ant: c.Ant,
    tensionFactor: c.strength.tensionFactor,
    nominal: c.strength.nominal,
    available: c.strength.available,
    tensionHoles: c.tensionHoles,
    source: c.source,
  };
}

/**
 * Block shear of the bolt group at the member's free end (AISC 360 J4.3, EN 1993-1-8 3.10.2, CSA
 * S16 13.11). For `-x` the member's body lies toward −x and the free end `endDistance` beyond the
 * +x-most bolt row (for `+x`, beyond the −x-most): the block tears toward the free end and its tension
 * plane crosses each bolt line at the hole nearest the body. The whole cross-section (a plate's width,
 * or every element of a section) takes part, so an outline may cut a tee's stem or a channel's flange;
 * {@link blockOutlines} lists every outline, each with its own tension factor (`blockShear.byOutline`,
 * else Ubs / Ut), and the least over outlines and directions governs.
 *
 * @param model - the member model (its input's `blockShear`, the hole widths, a rolled shape's
 *   unfolded section)
 * @param directions - directions to check
 * @returns the governing tear-out, or undefined without block-shear input or when no outline can form
 * @example
 * // R6 2L6x6x5/8, end distance 2.125 in: Agv 32.66, Anv 22.04, Agt 4.69, Ant 4.07 in², φRn 706 kips
 * memberBlockShear(memberModel(member, aisc), ['-x'])?.available // → 705.8
 */
export function memberBlockShear(
  model: MemberModel,
  directions: readonly LoadDirection[],
): MemberBlockShear | undefined {
  const { input: member, profile, holeWidths, unfolded: layout } = model;
  const spec = member.blockShear;
  if (!spec || member.holes.length === 0) return undefined;
  const elements = layout ? (spec.elements ?? [...new Set(layout.holes.map((h) => h.element))]) : ['plate'];
  const xs = layout
    ? layout.holes.filter((h) => elements.includes(h.element)).map((h) => h.x)
    : member.holes.map((h) => h.x);
  if (xs.length === 0) return undefined;
  const form = code(member, profile);
  let best: MemberBlockShear | undefined;
  const all: MemberBlockOutline[] = [];
  for (const direction of directions) {
    // The free end lies beyond the bolt row farthest from the body.
    const endX = direction === '-x' ? Math.max(...xs) + spec.endDistance : Math.min(...xs) - spec.endDistance;
    let blockLayout: BlockShearLayout;
    try {
      blockLayout = layout
        ? sectionBlockLayout(layout, elements, direction, endX)
        : {
            elements: [{ id: 'plate', thickness: member.thickness, span: member.width }],
            junctions: [],
            holes: member.holes.map((h, i) => ({
              id: h.id,
              element: 'plate',
              x: h.x,
              u: h.y,
              deducted: holeWidths[i]!.deducted,
            })),
            direction,
            endX,
          };
    } catch (err) {
      if (err instanceof BlockShearError) return undefined;
      throw err;
    }
    const result = blockShear(blockLayout, form, spec.byOutline);
    const g = result.governing;
    if (!g) continue;
    all.push(...result.cases.map((c) => outlineOf(c, direction)));
    const parts = [...new Set([...g.shearPlanes.map((p) => p.element), ...g.tension.map((t) => t.element)])];
    const candidate: MemberBlockShear = {
      direction,
      Agv: g.Agv,
      Anv: g.Anv,
      Agt: g.Agt,
      Ant: g.Ant,
      nominal: g.strength.nominal,
      factor: g.strength.factor,
      available: g.strength.available,
      clause: g.strength.clause,
      kind: g.kind,
      description: g.description,
      tensionFactor: g.strength.tensionFactor,
      parts: parts.map((element) => ({
        element,
        kind: g.kind,
        tensionHoles: g.tensionHoles.filter(
          (id) => blockLayout.holes.find((h) => h.id === id)?.element === element,
        ),
        staggerSum: g.staggerSum,
        source: g.source,
        available: g.strength.available,
      })),
      projectDefined: g.source === 'project-defined',
      outlines: [],
    };
    if (!best || candidate.available < best.available) best = candidate;
  }
  if (!best) return undefined;
  all.sort((a, b) => a.available - b.available);
  return { ...best, outlines: all.slice(0, KEPT) };
}
