import type { ProfileStrength } from '../profiles/types.js';
import type { CodeProfile, MemberModel, MemberResult, MemberShearLag, Strength } from '../types.js';
import { tensionProfileOf } from './tensionProfileOf.js';

// AISC 360 D2: φt = 0.90, Ωt = 1.67 for tensile yielding; φt = 0.75, Ωt = 2.00 for tensile rupture.
const FACTORS: Record<'yielding' | 'rupture', { readonly phi: number; readonly omega: number }> = {
  yielding: { phi: 0.9, omega: 1.67 },
  rupture: { phi: 0.75, omega: 2.0 },
};

function aisc(limitState: 'yielding' | 'rupture', nominal: number, profile: CodeProfile): Strength {
  const { phi, omega } = FACTORS[limitState];
  const factor = profile.method === 'LRFD' ? phi : omega;
  return {
    limitState,
    nominal,
    factor,
    available: profile.method === 'LRFD' ? phi * nominal : nominal / omega,
  };
}

function fromProfile(s: ProfileStrength): Strength {
  return { limitState: s.limitState, nominal: s.nominal, factor: s.factor, available: s.available };
}

/** Tensile yielding and rupture of a member, with the clause of each under EN 1993 and CSA S16. */
export interface TensileStrengths {
  readonly yielding: Strength;
  readonly rupture: Strength;
  readonly clauses?: MemberResult['clauses'];
}

/**
 * Tensile yielding and rupture (cli/docs/method.md §5). AISC 360 D2: Pn = Fy Ag (φ 0.90, Ω 1.67) and
 * Pn = Fu Ae (φ 0.75, Ω 2.00); in `mm` MPa·mm² = N, reported in kN. EN 1993-1-1 6.2.3 and CSA S16
 * 13.2 come from the code's profile ({@link tensionProfileOf}): EN's Nu,Rd = 0.9 Anet fu / γM2
 * carries its own 0.9, so only a 3.10.3 angle (or a given U) passes Ae; CSA always takes Ane.
 *
 * @param model - the member model (material, profile)
 * @param areas - Ag, An and the effective net area with the shear lag it came from
 * @returns the two strengths, and their clauses under EN and CSA
 * @example
 * // AISC Design Examples v13.0 D.9, A36, LRFD: 0.90 · 36 · 7 and 0.75 · 58 · 5.7708
 * tensileStrengths(memberModel(d9Member, aisc), { Ag: 7, An: 5.7708, Ae: 5.7708 }).yielding.available // → 226.8
 */
export function tensileStrengths(
  model: MemberModel,
  areas: {
    readonly Ag: number;
    readonly An: number;
    readonly Ae: number;
    readonly shearLag?: MemberShearLag;
  },
): TensileStrengths {
  const { input: member, profile } = model;
  const { Ag, An, Ae, shearLag } = areas;
  const tension = tensionProfileOf(profile);
  if (!tension) {
    const toForce = profile.units === 'mm' ? 1 / 1000 : 1;
    return {
      yielding: aisc('yielding', member.material.Fy * Ag * toForce, profile),
      rupture: aisc('rupture', member.material.Fu * Ae * toForce, profile),
    };
  }
  // EN 6.2.3 (6.7) carries its own 0.9; a 3.10.3 angle (or a given U) passes Ae instead.
  const reduced = shearLag !== undefined && shearLag.rule !== 'EN 1993-1-1 6.2.3';
  const r = tension.tensionResistance({
    Ag,
    An,
    ...(reduced || profile.standard === 'CSA S16-19' ? { Ae } : {}),
    Fy: member.material.Fy,
    Fu: member.material.Fu,
  });
  return {
    yielding: fromProfile(r.yielding),
    rupture: fromProfile(r.rupture),
    clauses: { yielding: r.yielding.clause, rupture: r.rupture.clause },
  };
}
