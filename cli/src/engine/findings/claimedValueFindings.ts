import { formatDirection } from './formatDirection.js';
import { formatQuantity, type Dimension } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import { percentDifference } from './percentDifference.js';
import { withinTolerance } from './withinTolerance.js';
import type { MemberBlockOutline, MemberResult } from '../types.js';
import type { AuditScope, Finding, MemberClaims, Tolerance } from './types.js';

type ScalarClaim = Exclude<keyof MemberClaims, 'chains' | 'controllingChain'>;

/** Codes for each scalar claim: [overstated, understated], with its dimension and label. */
const SCALARS: readonly {
  readonly key: ScalarClaim;
  readonly codes: readonly [string, string];
  readonly dimension: Dimension;
  readonly label: string;
}[] = [
  { key: 'Ag', codes: ['LG105', 'LG115'], dimension: 'area', label: 'Ag' },
  { key: 'An', codes: ['LG101', 'LG111'], dimension: 'area', label: 'An' },
  { key: 'U', codes: ['LG104', 'LG114'], dimension: 'ratio', label: 'U' },
  { key: 'Ae', codes: ['LG102', 'LG112'], dimension: 'area', label: 'Ae' },
  { key: 'yielding', codes: ['LG103', 'LG113'], dimension: 'force', label: 'yielding strength' },
  { key: 'rupture', codes: ['LG103', 'LG113'], dimension: 'force', label: 'rupture strength' },
  { key: 'available', codes: ['LG103', 'LG113'], dimension: 'force', label: 'available strength' },
  { key: 'Agv', codes: ['LG107', 'LG117'], dimension: 'area', label: 'block shear Agv' },
  { key: 'Anv', codes: ['LG107', 'LG117'], dimension: 'area', label: 'block shear Anv' },
  { key: 'Agt', codes: ['LG107', 'LG117'], dimension: 'area', label: 'block shear Agt' },
  { key: 'Ant', codes: ['LG107', 'LG117'], dimension: 'area', label: 'block shear Ant' },
  { key: 'blockShear', codes: ['LG106', 'LG116'], dimension: 'force', label: 'block shear strength' },
];

const BLOCK_AREAS = ['Agv', 'Anv', 'Agt', 'Ant'] as const;

/**
 * The outline the claimed block shear areas describe: of the least outlines kept, one whose areas all
 * agree with the claimed ones within tolerance (a claim for another outline than the governing one is
 * then compared with that outline's own areas, and only its strength with the governing one); else the
 * governing outline.
 */
function claimedOutline(
  result: MemberResult,
  claims: MemberClaims,
  tolerance: Tolerance,
): MemberBlockOutline | undefined {
  const block = result.blockShear;
  if (!block) return undefined;
  const keys = BLOCK_AREAS.filter((k) => claims[k] !== undefined);
  if (keys.length === 0) return block.outlines[0];
  return (
    block.outlines.find((o) => keys.every((k) => withinTolerance(claims[k]!, o[k], 'area', tolerance))) ??
    block.outlines[0]
  );
}

function recomputedScalar(
  key: ScalarClaim,
  result: MemberResult,
  outline: MemberBlockOutline | undefined,
): number | undefined {
  switch (key) {
    case 'Agv':
    case 'Anv':
    case 'Agt':
    case 'Ant':
      return outline?.[key];
    case 'blockShear':
      return result.blockShear?.available;
    case 'Ag':
      return result.Ag;
    case 'An':
      return result.An;
    case 'U':
      return result.U;
    case 'Ae':
      return result.Ae;
    case 'yielding':
      return result.yielding.available;
    case 'rupture':
      return result.rupture.available;
    case 'available':
      // The least of yielding, rupture and block shear (analyseModel).
      return result.governing.available;
  }
}

function context(result: MemberResult, key: ScalarClaim, outline: MemberBlockOutline | undefined): string {
  if ((BLOCK_AREAS as readonly string[]).includes(key) && outline) {
    return ` (outline ${outline.kind}: ${outline.description}, ${formatDirection(outline.direction)})`;
  }
  if (key === 'available' && result.governing.limitState === 'block shear' && result.blockShear) {
    return ` (block shear governs, ${result.blockShear.clause})`;
  }
  if (key !== 'An' && key !== 'Ae' && key !== 'rupture' && key !== 'available') return '';
  const d = result.directions.find((r) => r.direction === result.governingDirection);
  if (!d?.governing || d.An >= result.Ag) return '';
  return ` (chain ${d.governing.holes.join('-')}, ${formatDirection(d.direction)})`;
}

/**
 * The claimed numbers of a member against the recomputed ones (cli/docs/method.md §8): each claim
 * outside the tolerance is an overstated finding (LG101–LG107, errors: more area or strength than
 * the recomputation gives) or an understated one (LG111–LG117, notes), with both values, the
 * difference in percent and what the recomputed value comes from (the governing chain, the block
 * shear outline). Claimed block shear areas are compared with the least outline they describe within
 * tolerance, else with the governing one; `available` with the least of yielding, rupture and block
 * shear.
 *
 * @param result - the member's analysis
 * @param claims - what the submitter claims
 * @param scope - member id, pointer, units and tolerance
 * @returns the findings, in the order Ag, An, U, Ae, yielding, rupture, available, block shear
 * @example
 * // D.9 claimed with An 6.10 in²: the recomputed 5.77 in² is 5.7 % less
 * claimedValueFindings(d9Result, { An: 6.1 }, scope)[0]?.code // → 'LG101'
 */
export function claimedValueFindings(
  result: MemberResult,
  claims: MemberClaims,
  scope: AuditScope,
): Finding[] {
  const u = scope.units;
  const findings: Finding[] = [];
  const outline = claimedOutline(result, claims, scope.tolerance);
  for (const { key, codes, dimension, label } of SCALARS) {
    const claimed = claims[key];
    if (claimed === undefined) continue;
    const recomputed = recomputedScalar(key, result, outline);
    if (recomputed === undefined) continue;
    if (withinTolerance(claimed, recomputed, dimension, scope.tolerance)) continue;
    const over = claimed > recomputed;
    findings.push(
      makeFinding(over ? codes[0] : codes[1], {
        memberId: scope.memberId,
        claimed,
        recomputed,
        message: `Claimed ${label} ${formatQuantity(claimed, dimension, u)} ${over ? 'exceeds' : 'is below'} the recomputed ${formatQuantity(recomputed, dimension, u)}${context(result, key, outline)}${percentDifference(claimed, recomputed)}`,
        pointer: `${scope.pointer}/claims/${key}`,
      }),
    );
  }
  return findings;
}
