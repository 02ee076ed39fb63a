import { netSections } from './net-area/netSections.js';
import { effectiveNetArea } from './net-area/effectiveNetArea.js';
import { memberBlockShear } from './strength/memberBlockShear.js';
import { tensileStrengths } from './strength/tensileStrengths.js';
import type { AnalyseOptions, MemberModel, MemberResult, Strength } from './types.js';

/**
 * Net section and tensile strength of a built member for each load direction (cli/docs/method.md
 * §3–5, AISC 360 D2, D3, J4.1), step by step: the net section per direction ({@link netSections}:
 * Ag; the least chain that can form under the full load, its k least companions and, on plates, the
 * equal-share rule; An = min over directions of min(governing net area, Ag)); the effective net area
 * ({@link effectiveNetArea}: Ae = An·U, U from the connection or 1.0, capped at 0.85 Ag for AISC
 * bolted splice plates); tensile yielding and rupture ({@link tensileStrengths}: AISC 360 D2, or the
 * EN 1993-1-1 / CSA S16 profile); and, with block-shear input, the governing tear-out
 * ({@link memberBlockShear}), which enters `governing`, the least of yielding, rupture and block shear.
 *
 * @param model - the member built once ({@link memberModel})
 * @param options - k least chains per direction (default 10); directions (default the member's)
 * @returns the result
 * @throws EngineError when a direction's least chain leaves a net area ≤ 0 (the loader reports that
 *   as the rule net-area-positive with the file and pointer)
 * @example
 * // AISC Design Examples v13.0 D.9: 14 × 1/2 plate, A36, four 3/4 in bolts, loaded from -x
 * const r = analyseModel(memberModel(d9Member, { standard: 'AISC 360-22', method: 'LRFD', units: 'in' }));
 * r.Ag // → 7
 * r.An // → 5.7708 (published 5.75 in², from 11.5 in × 1/2)
 * r.yielding.available // → 226.8 (0.90 · 36 · 7)
 */
export function analyseModel(model: MemberModel, options: AnalyseOptions = {}): MemberResult {
  const member = model.input;
  const directions = options.directions ?? member.directions;
  const {
    Ag,
    grossArea,
    directions: results,
    An,
    governingDirection,
  } = netSections(model, directions, options.k ?? 10);
  const { shearLag, U, Ae, capped } = effectiveNetArea(model, An, Ag);
  const { yielding, rupture, clauses } = tensileStrengths(model, {
    Ag,
    An,
    Ae,
    ...(shearLag ? { shearLag } : {}),
  });
  const block = memberBlockShear(model, directions);
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
    holeWidths: model.holeWidths,
    directions: results,
    An,
    governingDirection,
    U,
    Ae,
    capped,
    yielding,
    rupture,
    governing,
  };
  return member.requiredStrength === undefined
    ? result
    : { ...result, utilisation: member.requiredStrength / governing.available };
}
