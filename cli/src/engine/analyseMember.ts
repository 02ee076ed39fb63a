import { EngineError } from './engineError.js';
import { leastChains } from './chains/leastChains.js';
import { memberBlockShear } from './strength/memberBlockShear.js';
import { memberHoleWidth } from './holes/memberHoleWidth.js';
import { memberLayout } from './member/memberLayout.js';
import { memberSection } from './member/memberSection.js';
import { memberShearLag } from './net-area/memberShearLag.js';
import type { ProfileStrength } from './profiles/types.js';
import { analyseSection } from './sections/analyseSection.js';
import type { SectionChain, SectionLayout } from './sections/types.js';
import { shareCheck } from './chains/shareCheck.js';
import { tensionProfileOf } from './strength/tensionProfileOf.js';
import type {
  AnalyseOptions,
  Chain,
  CodeProfile,
  DirectionResult,
  HoleWidth,
  LoadDirection,
  MemberGrossArea,
  MemberInput,
  MemberResult,
  Strength,
} from './types.js';

// AISC 360 D2: φt = 0.90, Ωt = 1.67 for tensile yielding; φt = 0.75, Ωt = 2.00 for tensile rupture.
const FACTORS: Record<'yielding' | 'rupture', { readonly phi: number; readonly omega: number }> = {
  yielding: { phi: 0.9, omega: 1.67 },
  rupture: { phi: 0.75, omega: 2.0 },
};

function strength(limitState: 'yielding' | 'rupture', nominal: number, profile: CodeProfile): Strength {
  const { phi, omega } = FACTORS[limitState];
  const factor = profile.method === 'LRFD' ? phi : omega;
  return {
    limitState,
    nominal,
    factor,
    available: profile.method === 'LRFD' ? phi * nominal : nominal / omega,
  };
}

/**
 * A section chain in the plate chain's shape: deducted and staggerSum are widths (Σ hole widths,
 * Σ s²/4g), netArea the section's, and netWidth = netArea / (pieces · member thickness), the width of
 * a flat plate of the member's (first element's) thickness with the same net area.
 */
export function sectionChainAsChain(chain: SectionChain, thickness: number, pieces: number): Chain {
  return {
    holes: chain.holes,
    legs: chain.legs.map((l) => ({ from: l.from, to: l.to, s: l.s, g: l.g, term: l.term })),
    deducted: chain.deductedArea / (pieces * thickness),
    staggerSum: chain.legs.reduce((sum, l) => sum + l.term, 0),
    netWidth: chain.netArea / (pieces * thickness),
    netArea: chain.netArea,
  };
}

/** The unfolded section of a section member, with its holes' deducted widths. */
export function memberSectionLayout(
  member: MemberInput,
  holeWidths: readonly HoleWidth[],
  directions: readonly LoadDirection[],
  k: number,
) {
  const spec = member.section!;
  const section = memberSection(spec);
  const holes = member.holes.map((h, i) => {
    if (h.element === undefined || h.gauge === undefined) {
      throw new EngineError(
        'invalid-argument',
        `hole ${h.id}: a section member's holes need element and gauge`,
      );
    }
    return { id: h.id, element: h.element, x: h.x, gauge: h.gauge, deducted: holeWidths[i]!.deducted };
  });
  return analyseSection(section, holes, {
    directions,
    k,
    ...(spec.tabulatedAg !== undefined ? { tabulatedAg: spec.tabulatedAg } : {}),
  });
}

function fromProfile(s: ProfileStrength): Strength {
  return { limitState: s.limitState, nominal: s.nominal, factor: s.factor, available: s.available };
}

/**
 * Net section and tensile strength of a member for each load direction (cli/docs/method.md §3–5, AISC 360 D2,
 * D3, J4.1): Ag = width·t; per direction the least chain that can form under the full load, its k
 * least companions and the equal-share check; An = min over directions of min(governing net area, Ag);
 * Ae = An·U (U = 1.0 by default, Table D3.1 case 1), capped at 0.85 Ag for bolted splice plates only
 * (J4.1(b); a gusset is not capped); yielding Pn = Fy·Ag, rupture Pn = Fu·Ae; in `mm` MPa·mm² = N, reported in kN.
 *
 * Members with a `section` (angles, tees, W-shapes, channels) are unfolded and searched as connected
 * flat elements (sections/README.md); Ag is the tabulated value when given. U comes from
 * {@link memberShearLag}; when it names another net area for U (EN 1993-1-8 3.10.3(2), an unequal angle
 * bolted through its smaller leg), Ae is that area · U. Under EN 1993-1-1 and CSA S16-19 hole widths, net area rule and strengths
 * come from the code's profile (EN: Npl,Rd = A fy/γM0, Nu,Rd = 0.9 Anet fu/γM2 or 3.10.3 for angles;
 * CSA: Tr = φ Ag Fy, φu Ane Fu); the 0.85 Ag cap is AISC 360 J4.1's and applies only there. With
 * block-shear input the governing tear-out ({@link memberBlockShear}) is reported and enters
 * `governing`, the least of yielding, rupture and block shear.
 *
 * @param member - the member (width, thickness, material, holes, directions, U, required strength)
 * @param profile - code edition, design method and unit system
 * @param options - k least chains per direction (default 10); directions (default the member's)
 * @returns the result
 * @throws EngineError when a hole's bolt size is not in the hole table, width or thickness is not
 *   positive, or a direction's least chain leaves a net area ≤ 0 (the loader reports that as the rule
 *   net-area-positive with the file and pointer)
 * @example
 * // AISC Design Examples v13.0 D.9: 14 × 1/2 plate, A36, four 3/4 in bolts, loaded from -x
 * const r = analyseMember(d9Member, { standard: 'AISC 360-22', method: 'LRFD', units: 'in' });
 * r.Ag // → 7
 * r.An // → 5.7708 (published 5.75 in², from 11.5 in × 1/2)
 * r.yielding.available // → 226.8 (0.90 · 36 · 7)
 */
export function analyseMember(
  member: MemberInput,
  profile: CodeProfile,
  options: AnalyseOptions = {},
): MemberResult {
  const k = options.k ?? 10;
  const directions = options.directions ?? member.directions;
  const holeWidths = member.holes.map((h) => memberHoleWidth(h, profile));
  let Ag: number;
  let results: DirectionResult[];
  let grossArea: MemberGrossArea | undefined;
  let sectionLayout: SectionLayout | undefined;
  if (member.section) {
    const s = memberSectionLayout(member, holeWidths, directions, k);
    sectionLayout = s.layout;
    grossArea = s.grossArea;
    Ag = s.grossArea.used;
    const pieces = s.layout.section.pieces;
    results = s.directions.map((d) => ({
      direction: d.direction,
      governing: d.governing ? sectionChainAsChain(d.governing, member.thickness, pieces) : null,
      leastChains: d.leastChains.map((c) => sectionChainAsChain(c, member.thickness, pieces)),
      An: d.An,
      share: null,
    }));
  } else {
    const layout = memberLayout(member, profile, holeWidths);
    Ag = member.width * member.thickness;
    results = directions.map((direction) => {
      const least = leastChains(layout, direction, k);
      const governing = least[0] ?? null;
      return {
        direction,
        governing,
        leastChains: least,
        An: governing ? Math.min(governing.netArea, Ag) : Ag,
        share: shareCheck(layout, direction),
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
  const shearLag = memberShearLag(member, profile, An, sectionLayout);
  const U = shearLag?.U ?? 1.0;
  // EN 1993-1-8 3.10.3(2): an unequal angle bolted through its smaller leg takes β on another Anet.
  const uncapped = (shearLag?.netArea?.area ?? An) * U;
  if (!(uncapped > 0)) {
    throw new EngineError(
      'invalid-argument',
      `member ${member.id}: the net area U multiplies is ${shearLag?.netArea?.area ?? An}, not positive (rule net-area-positive)`,
    );
  }
  const tension = tensionProfileOf(profile);
  // AISC 360 J4.1(b): "for bolted splice plates, Ae = An ≤ 0.85 Ag"; gussets are not capped.
  const cap = !tension && member.kind === 'splice-plate' ? 0.85 * Ag : Number.POSITIVE_INFINITY;
  const Ae = Math.min(uncapped, cap);
  const toForce = profile.units === 'mm' ? 1 / 1000 : 1;
  let yielding: Strength;
  let rupture: Strength;
  let clauses: MemberResult['clauses'];
  if (tension) {
    // EN 6.2.3 (6.7) carries its own 0.9; a 3.10.3 angle (or a given U) passes Ae instead.
    const reduced = shearLag !== undefined && shearLag.rule !== 'EN 1993-1-1 6.2.3';
    const r = tension.tensionResistance({
      Ag,
      An,
      ...(reduced || profile.standard === 'CSA S16-19' ? { Ae } : {}),
      Fy: member.material.Fy,
      Fu: member.material.Fu,
    });
    yielding = fromProfile(r.yielding);
    rupture = fromProfile(r.rupture);
    clauses = { yielding: r.yielding.clause, rupture: r.rupture.clause };
  } else {
    yielding = strength('yielding', member.material.Fy * Ag * toForce, profile);
    rupture = strength('rupture', member.material.Fu * Ae * toForce, profile);
  }
  const block = memberBlockShear(member, profile, holeWidths, directions, sectionLayout);
  const tensile = rupture.available < yielding.available ? rupture : yielding;
  // Block shear is a limit state of the member's end like rupture: the least of the three governs.
  const governing: Strength =
    block && block.available < tensile.available
      ? {
          limitState: 'block shear',
          nominal: block.nominal,
          factor: block.factor,
          available: block.available,
        }
      : tensile;
  const result: MemberResult = {
    ...(grossArea ? { grossArea } : {}),
    ...(shearLag ? { shearLag } : {}),
    ...(block ? { blockShear: block } : {}),
    ...(clauses ? { clauses } : {}),
    memberId: member.id,
    Ag,
    holeWidths,
    directions: results,
    An,
    governingDirection,
    U,
    Ae,
    capped: uncapped > cap,
    yielding,
    rupture,
    governing,
  };
  return member.requiredStrength === undefined
    ? result
    : { ...result, utilisation: member.requiredStrength / governing.available };
}
