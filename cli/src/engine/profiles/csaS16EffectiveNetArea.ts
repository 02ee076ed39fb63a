import { ProfileError } from './profileError.js';

/** Input of {@link csaS16EffectiveNetArea}. */
export interface CsaS16ShearLagInput {
  /** Net area An, mm². */
  readonly An: number;
  /** `angle`: connected by one leg; `w-flange`: W, WWF or S connected by its flanges only, or a tee cut from one. */
  readonly shape: 'angle' | 'w-flange' | 'other';
  /** Transverse lines of fasteners (bolts per line along the load). */
  readonly transverseLines: number;
  /** Flange width and depth, for `w-flange`. */
  readonly bf?: number;
  readonly d?: number;
}

/**
 * Effective net area with shear lag for bolted members, CSA S16 12.3.3.2: angles connected by one leg
 * Ane = 0.80 An with 4 or more transverse lines, 0.60 An with fewer (published in R3's notes); W, WWF,
 * S shapes with bf ≥ 2/3 d and tees cut from them, flanges only, 3 or more lines 0.90 An; other shapes
 * 0.85 An with 3 or more lines, 0.75 An with 2 (as restated by webcivil.com's S16 summary — a secondary
 * source; confirm against the standard).
 *
 * @param input - An, shape, lines, bf and d for W flanges
 * @returns Ane, mm², with the factor applied
 * @throws ProfileError when no rule applies (one line, or a W flange below 2/3 d treated as `other`)
 * @example
 * csaS16EffectiveNetArea({ An: 2000, shape: 'angle', transverseLines: 3 }) // → { Ane: 1200, factor: 0.6 }
 */
export function csaS16EffectiveNetArea(input: CsaS16ShearLagInput): { Ane: number; factor: number } {
  const n = input.transverseLines;
  let factor: number | null;
  if (input.shape === 'angle') factor = n >= 4 ? 0.8 : n >= 1 ? 0.6 : null;
  else if (input.shape === 'w-flange') {
    if (input.bf === undefined || input.d === undefined)
      throw new ProfileError('a W flange connection needs bf and d');
    if (n >= 3 && input.bf >= (2 / 3) * input.d) factor = 0.9;
    else factor = n >= 3 ? 0.85 : n === 2 ? 0.75 : null;
  } else factor = n >= 3 ? 0.85 : n === 2 ? 0.75 : null;
  if (factor === null)
    throw new ProfileError(`no CSA S16 12.3.3.2 rule for ${n} transverse line(s) of fasteners`);
  return { Ane: factor * input.An, factor };
}
