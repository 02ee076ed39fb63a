import { holeWidth } from './holeWidth.js';
import { leastChains } from './leastChains.js';
import { memberLayout } from './memberLayout.js';
import { shareCheck } from './shareCheck.js';
import type {
  AnalyseOptions,
  CodeProfile,
  DirectionResult,
  LimitState,
  MemberInput,
  MemberResult,
  Strength,
} from './types.js';

// AISC 360 D2: φt = 0.90, Ωt = 1.67 for tensile yielding; φt = 0.75, Ωt = 2.00 for tensile rupture.
const FACTORS: Record<LimitState, { readonly phi: number; readonly omega: number }> = {
  yielding: { phi: 0.9, omega: 1.67 },
  rupture: { phi: 0.75, omega: 2.0 },
};

function strength(limitState: LimitState, nominal: number, profile: CodeProfile): Strength {
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
 * Net section and tensile strength of a member for each load direction (DOMAIN §3–5, AISC 360 D2,
 * D3, J4.1): Ag = width·t; per direction the least chain that can form under the full load, its k
 * least companions and the equal-share check; An = min over directions of min(governing net area, Ag);
 * Ae = An·U (U = 1.0 by default, Table D3.1 case 1), capped at 0.85 Ag for splice plates and gussets
 * (J4.1(b)); yielding Pn = Fy·Ag, rupture Pn = Fu·Ae; in `mm` MPa·mm² = N, reported in kN.
 *
 * @param member - the member (width, thickness, material, holes, directions, U, required strength)
 * @param profile - code edition, design method and unit system
 * @param options - k least chains per direction (default 10); directions (default the member's)
 * @returns the result
 * @throws EngineError when a hole's bolt size is not in the hole table, or width or thickness is not positive
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
  const holeWidths = member.holes.map((h) => holeWidth(h, profile));
  const layout = memberLayout(member, profile, holeWidths);
  const Ag = member.width * member.thickness;
  const results: DirectionResult[] = directions.map((direction) => {
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
  let governingDirection = directions[0] ?? '-x';
  let An = Ag;
  for (const d of results) {
    if (d.An < An) {
      An = d.An;
      governingDirection = d.direction;
    }
  }
  const U = member.U ?? 1.0;
  const uncapped = An * U;
  const cap = member.kind === 'plate' ? Number.POSITIVE_INFINITY : 0.85 * Ag;
  const Ae = Math.min(uncapped, cap);
  const toForce = profile.units === 'mm' ? 1 / 1000 : 1;
  const yielding = strength('yielding', member.material.Fy * Ag * toForce, profile);
  const rupture = strength('rupture', member.material.Fu * Ae * toForce, profile);
  const governing = rupture.available < yielding.available ? rupture : yielding;
  const result: MemberResult = {
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
