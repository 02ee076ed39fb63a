import { ProfileError } from './profileError.js';
import type { ProfileTensionInput, ProfileTensionResult } from './types.js';

/** Partial factors of EN 1993-1-1; recommended values 1.00 and 1.25 (a National Annex may differ). */
export interface En1993Factors {
  readonly gammaM0?: number;
  readonly gammaM2?: number;
}

/**
 * Design tension resistance, EN 1993-1-1 6.2.3: Npl,Rd = A fy/γM0 (6.6), Nu,Rd = 0.9 Anet fu/γM2
 * (6.7), Nt,Rd the lesser. With `Ae` given (e.g. an angle's reduced net area by EN 1993-1-8 3.10.3,
 * whose β already replaces the 0.9), Nu,Rd is Ae·fu/γM2 instead.
 *
 * @param input - A, Anet (An), optional Ae, fy (Fy), fu (Fu)
 * @param factors - γM0, γM2 overrides for a National Annex
 * @returns both resistances and the governing one, kN
 * @example
 * // S355 (fy 355, fu 510), A 3000 mm², Anet 2500 mm²: Npl,Rd 1065 kN, Nu,Rd 918 kN
 * en1993TensionResistance({ Ag: 3000, An: 2500, Fy: 355, Fu: 510 }).governing.available // → 918
 */
export function en1993TensionResistance(
  input: ProfileTensionInput,
  factors: En1993Factors = {},
): ProfileTensionResult {
  const gM0 = factors.gammaM0 ?? 1.0;
  const gM2 = factors.gammaM2 ?? 1.25;
  if (!(gM0 > 0 && gM2 > 0 && input.Fy > 0 && input.Fu > 0 && input.Ag > 0 && input.An > 0)) {
    throw new ProfileError('A, Anet, fy, fu, γM0 and γM2 must be positive');
  }
  const plastic = (input.Ag * input.Fy) / 1000;
  const ultimate = input.Ae === undefined ? (0.9 * input.An * input.Fu) / 1000 : (input.Ae * input.Fu) / 1000;
  const yielding = {
    limitState: 'yielding',
    nominal: plastic,
    factor: gM0,
    available: plastic / gM0,
    clause: 'EN 1993-1-1 6.2.3 (6.6)',
  } as const;
  const rupture = {
    limitState: 'rupture',
    nominal: ultimate,
    factor: gM2,
    available: ultimate / gM2,
    clause: input.Ae === undefined ? 'EN 1993-1-1 6.2.3 (6.7)' : 'EN 1993-1-8 3.10.3',
  } as const;
  return { yielding, rupture, governing: rupture.available < yielding.available ? rupture : yielding };
}
