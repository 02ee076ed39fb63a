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
  /** Net area Anet of the angle as it is, mm² (see `legs` for an unequal angle). */
  readonly Anet?: number;
  /**
   * Leg sizes, mm: the connected leg and the outstanding one. When the connected leg is the smaller of
   * an unequal-leg angle, 3.10.3(2) applies and Anet is taken as that of the equivalent equal-leg angle
   * of the smaller leg's size: Anet − (outstanding − connected)·t (the outstanding leg shortened, the
   * holes, all in the connected leg, unchanged).
   */
  readonly legs?: { readonly connected: number; readonly outstanding: number };
  /** Pitch p1, mm (2 or more bolts). */
  readonly p1?: number;
  /** Edge distance e2 from the hole centre to the leg's free edge, mm (1 bolt). */
  readonly e2?: number;
  readonly gammaM2?: number;
}

/** Result of {@link en1993AngleOneLeg}. */
export interface En1993AngleResult {
  /** Nu,Rd, kN. */
  readonly NuRd: number;
  /** β2 or β3 of Table 3.8; null for one bolt. */
  readonly beta: number | null;
  /** The net area β multiplies, mm² (null for one bolt, whose formula has none). */
  readonly Anet: number | null;
  /** Leg size of the equivalent equal-leg angle when 3.10.3(2) replaced the angle's Anet. */
  readonly equivalentLeg?: number;
}

/**
 * Ultimate resistance of an angle connected through one leg by one row of bolts, EN 1993-1-8 3.10.3:
 * 1 bolt Nu,Rd = 2.0 (e2 − 0.5 d0) t fu/γM2; 2 bolts β2 Anet fu/γM2; 3 or more β3 Anet fu/γM2, with
 * β2, β3 from Table 3.8 by pitch: p1 ≤ 2.5 d0 → β2 0.4, β3 0.5; p1 ≥ 5.0 d0 → 0.7 and 0.7; linear
 * between. Table 3.8's values are from memory of the standard (confirm before relying on them).
 * 3.10.3(2): for an unequal-leg angle connected by its smaller leg, Anet is that of an equivalent
 * equal-leg angle with legs the size of the smaller one; given `legs`, the function applies it itself.
 *
 * @param input - bolts, d0, t, fu, and Anet and p1 (2+ bolts) or e2 (1 bolt); legs for 3.10.3(2)
 * @returns Nu,Rd in kN with the β used (null for one bolt) and the Anet it multiplies
 * @throws ProfileError when a needed value is missing
 * @example
 * // 3 bolts, d0 22, p1 = 3.75 d0 = 82.5 → β3 = 0.6; Anet 2006, fu 360: 0.6·2006·360/1.25/1000
 * en1993AngleOneLeg({ bolts: 3, d0: 22, t: 12, fu: 360, Anet: 2006, p1: 82.5 }) // → { NuRd: 346.64, beta: 0.6, Anet: 2006 }
 * // the same holes in the 80 leg of an L120×80×12: Anet 2006 − (120 − 80)·12 = 1526 (equivalent L80×80×12)
 * en1993AngleOneLeg({ …, legs: { connected: 80, outstanding: 120 } }).Anet // → 1526
 */
export function en1993AngleOneLeg(input: En1993AngleInput): En1993AngleResult {
  const gM2 = input.gammaM2 ?? 1.25;
  if (!(Number.isInteger(input.bolts) && input.bolts >= 1))
    throw new ProfileError('bolts must be a whole number ≥ 1');
  if (input.bolts === 1) {
    if (input.e2 === undefined) throw new ProfileError('one bolt: e2 is needed (EN 1993-1-8 3.10.3 (3.11))');
    return {
      NuRd: (2.0 * (input.e2 - 0.5 * input.d0) * input.t * input.fu) / gM2 / 1000,
      beta: null,
      Anet: null,
    };
  }
  if (input.Anet === undefined || input.p1 === undefined) {
    throw new ProfileError('two or more bolts: Anet and p1 are needed (EN 1993-1-8 3.10.3)');
  }
  const [low, high] = input.bolts === 2 ? [0.4, 0.7] : [0.5, 0.7];
  const r = (input.p1 / input.d0 - 2.5) / 2.5;
  const beta = low + (high - low) * Math.min(1, Math.max(0, r));
  const legs = input.legs;
  if (legs && !(legs.connected > input.t && legs.outstanding > input.t)) {
    throw new ProfileError('leg sizes must exceed the thickness');
  }
  const smaller = legs !== undefined && legs.connected < legs.outstanding;
  const Anet = smaller ? input.Anet - (legs.outstanding - legs.connected) * input.t : input.Anet;
  if (!(Anet > 0)) throw new ProfileError(`Anet must be positive, got ${Anet}`);
  return {
    NuRd: (beta * Anet * input.fu) / gM2 / 1000,
    beta,
    Anet,
    ...(smaller ? { equivalentLeg: legs.connected } : {}),
  };
}
