import { ProfileError } from './profileError.js';

/** Input of {@link en1993AngleOneLeg}. */
export interface En1993AngleInput {
  /** Bolts in the single row along the load. */
  readonly bolts: number;
  /** Hole diameter d0, mm. */
  readonly d0: number;
  /** Leg thickness t, mm. */
  readonly t: number;
  /** Tensile strength fu, MPa. */
  readonly fu: number;
  /** Net area Anet, mm² (for an unequal angle connected by its smaller leg, that of an equal angle of the smaller leg). */
  readonly Anet?: number;
  /** Pitch p1, mm (2 or more bolts). */
  readonly p1?: number;
  /** Edge distance e2 from the hole centre to the leg's free edge, mm (1 bolt). */
  readonly e2?: number;
  readonly gammaM2?: number;
}

/**
 * Ultimate resistance of an angle connected through one leg by one row of bolts, EN 1993-1-8 3.10.3:
 * 1 bolt Nu,Rd = 2.0 (e2 − 0.5 d0) t fu/γM2; 2 bolts β2 Anet fu/γM2; 3 or more β3 Anet fu/γM2, with
 * β2, β3 from Table 3.8 by pitch: p1 ≤ 2.5 d0 → β2 0.4, β3 0.5; p1 ≥ 5.0 d0 → 0.7 and 0.7; linear
 * between. Table 3.8's values are from memory of the standard (confirm before relying on them).
 *
 * @param input - bolts, d0, t, fu, and Anet and p1 (2+ bolts) or e2 (1 bolt)
 * @returns Nu,Rd in kN with the β used (null for one bolt)
 * @throws ProfileError when a needed value is missing
 * @example
 * // 3 bolts, d0 22, p1 = 3.75 d0 = 82.5 → β3 = 0.6; Anet 2006, fu 360: 0.6·2006·360/1.25/1000
 * en1993AngleOneLeg({ bolts: 3, d0: 22, t: 12, fu: 360, Anet: 2006, p1: 82.5 }) // → { NuRd: 346.64, beta: 0.6 }
 */
export function en1993AngleOneLeg(input: En1993AngleInput): { NuRd: number; beta: number | null } {
  const gM2 = input.gammaM2 ?? 1.25;
  if (!(Number.isInteger(input.bolts) && input.bolts >= 1))
    throw new ProfileError('bolts must be a whole number ≥ 1');
  if (input.bolts === 1) {
    if (input.e2 === undefined) throw new ProfileError('one bolt: e2 is needed (EN 1993-1-8 3.10.3 (3.11))');
    return { NuRd: (2.0 * (input.e2 - 0.5 * input.d0) * input.t * input.fu) / gM2 / 1000, beta: null };
  }
  if (input.Anet === undefined || input.p1 === undefined) {
    throw new ProfileError('two or more bolts: Anet and p1 are needed (EN 1993-1-8 3.10.3)');
  }
  const [low, high] = input.bolts === 2 ? [0.4, 0.7] : [0.5, 0.7];
  const r = (input.p1 / input.d0 - 2.5) / 2.5;
  const beta = low + (high - low) * Math.min(1, Math.max(0, r));
  return { NuRd: (beta * input.Anet * input.fu) / gM2 / 1000, beta };
}
