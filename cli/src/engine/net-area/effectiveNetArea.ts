import { EngineError } from '../engineError.js';
import { tensionProfileOf } from '../strength/tensionProfileOf.js';
import type { MemberModel, MemberShearLag } from '../types.js';
import { memberShearLag } from './memberShearLag.js';

/** The effective net area of a member and how it was found. */
export interface EffectiveNetArea {
  /** How U was found (absent for a plate with the default U). */
  readonly shearLag?: MemberShearLag;
  readonly U: number;
  readonly Ae: number;
  /** True when AISC 360 J4.1(b)'s 0.85 Ag cap governed Ae. */
  readonly capped: boolean;
}

/**
 * Ae = An · U (AISC 360 D3; CSA S16 12.3.3 Ane; EN 1993-1-8 3.10.3 β), with U from
 * {@link memberShearLag} (1.0 for a plate without connection data, Table D3.1 case 1). When the rule
 * names another net area for U (EN 1993-1-8 3.10.3(2), an unequal angle bolted through its smaller
 * leg), Ae is that area · U. For bolted splice plates under AISC 360, Ae = An ≤ 0.85 Ag (J4.1(b));
 * a gusset is not capped, and the cap is AISC's only.
 *
 * @param model - the member model
 * @param An - the member's net area
 * @param Ag - the member's gross area
 * @returns U, its basis, Ae and whether the cap governed
 * @throws EngineError when the net area U multiplies is not positive (rule net-area-positive)
 * @example
 * // AISC Design Examples v13.0 D.9 as a splice plate: An 5.7708 < 0.85 · 7 = 5.95 in², not capped
 * effectiveNetArea(memberModel(d9Member, aisc), 5.7708, 7) // → { U: 1, Ae: 5.7708, capped: false }
 */
export function effectiveNetArea(model: MemberModel, An: number, Ag: number): EffectiveNetArea {
  const member = model.input;
  const shearLag = memberShearLag(model, An);
  const U = shearLag?.U ?? 1.0;
  // EN 1993-1-8 3.10.3(2): an unequal angle bolted through its smaller leg takes β on another Anet.
  const uncapped = (shearLag?.netArea?.area ?? An) * U;
  if (!(uncapped > 0)) {
    throw new EngineError(
      'invalid-argument',
      `member ${member.id}: the net area U multiplies is ${shearLag?.netArea?.area ?? An}, not positive (rule net-area-positive)`,
    );
  }
  // AISC 360 J4.1(b): "for bolted splice plates, Ae = An ≤ 0.85 Ag"; gussets are not capped.
  const cap =
    !tensionProfileOf(model.profile) && member.kind === 'splice-plate' ? 0.85 * Ag : Number.POSITIVE_INFINITY;
  return { ...(shearLag ? { shearLag } : {}), U, Ae: Math.min(uncapped, cap), capped: uncapped > cap };
}
