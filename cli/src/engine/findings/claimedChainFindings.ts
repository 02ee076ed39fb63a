import { sameHoles } from '../chains/sameHoles.js';
import { memberChainTools } from '../member/memberChainTools.js';
import type { Chain, LoadDirection, MemberModel, MemberResult } from '../types.js';
import { formatDirection } from './formatDirection.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import { percentDifference } from './percentDifference.js';
import { withinTolerance } from './withinTolerance.js';
import type { AuditScope, ClaimedChain, Finding, MemberClaims } from './types.js';

/** A claimed chain that exists and can form in at least one of the directions it is judged for. */
export interface AdmissibleClaim {
  readonly chain: Chain;
  readonly directions: readonly LoadDirection[];
  readonly claimed: ClaimedChain;
}

/**
 * The claimed chains of a member against its holes and load directions (cli/docs/method.md §4, §8):
 * a chain that names holes that are not a chain does not exist (LG123); one that cannot form under
 * the full load in any direction it is judged for (its own, else the member's) is LG122, an error when
 * it is the controlling chain and a warning otherwise; a claimed net width outside the tolerance is
 * LG124 (error when it exceeds the recomputed one). A claimed controlling chain that can form but is
 * wider than its direction's governing chain is LG125. The chains judged admissible are returned for
 * the missed-chain comparison ({@link missedChainFindings}).
 *
 * @param model - the member model (its chain tools)
 * @param result - the member's analysis (its directions and governing chains)
 * @param claims - what the submitter claims
 * @param scope - member id, pointer, units and tolerance
 * @returns the findings in claim order, then the controlling chain's, and the admissible claims
 * @example
 * // D.9 with the chain A–B claimed: its line runs on at x = 2.5 through C, from either end
 * claimedChainFindings(model, result, { chains: [{ holes: ['A', 'B'] }] }, scope).findings[0]?.code // → 'LG122'
 */
export function claimedChainFindings(
  model: MemberModel,
  result: MemberResult,
  claims: MemberClaims,
  scope: AuditScope,
): { readonly findings: Finding[]; readonly admissible: AdmissibleClaim[] } {
  const { tolerance, pointer: base, units: u } = scope;
  const at = { memberId: scope.memberId };
  const tools = memberChainTools(model);
  const directions = result.directions.map((d) => d.direction);
  const findings: Finding[] = [];
  const controlling = claims.controllingChain;
  const isControlling = (c: ClaimedChain): boolean =>
    controlling !== undefined &&
    sameHoles(c.holes, controlling.holes) &&
    (c.direction === undefined ||
      controlling.direction === undefined ||
      c.direction === controlling.direction);
  const admissibleClaims: AdmissibleClaim[] = [];
  const judgeChain = (claimed: ClaimedChain, pointer: string, controllingClaim: boolean): Chain | null => {
    const defect = tools.defect(claimed.holes);
    if (defect) {
      findings.push(
        makeFinding('LG123', {
          ...at,
          chain: claimed.holes,
          ...(claimed.direction ? { direction: claimed.direction } : {}),
          message: `Claimed chain ${claimed.holes.join('-') || '(empty)'} does not exist: ${defect.message}`,
          pointer: defect.reason === 'empty' ? `${pointer}/holes` : `${pointer}/holes/${defect.position}`,
        }),
      );
      return null;
    }
    const chain = tools.of(claimed.holes);
    const judged = claimed.direction ? [claimed.direction] : directions;
    const rejections = judged.map((d) => tools.rejection(chain, d));
    const admissible = judged.filter((_, i) => rejections[i] === null);
    if (admissible.length === 0 && judged.length > 0) {
      const why = rejections
        .map((r) =>
          r
            ? `hole ${r.blockingHole} lies ${r.reason === 'on-line' ? 'exactly on' : 'on the loaded side of'} its fracture line for ${formatDirection(r.direction)}`
            : '',
        )
        .join('; ');
      findings.push(
        makeFinding('LG122', {
          ...at,
          severity: controllingClaim ? 'error' : 'warning',
          chain: chain.holes,
          ...(claimed.direction ? { direction: claimed.direction } : {}),
          recomputed: chain.netWidth,
          message: `Claimed ${controllingClaim ? 'controlling ' : ''}chain ${chain.holes.join('-')} (${formatQuantity(chain.netWidth, 'length', u)}) cannot form under the full load: ${why}`,
          pointer,
        }),
      );
    } else {
      admissibleClaims.push({ chain, directions: admissible, claimed });
    }
    return chain;
  };

  const chains = claims.chains ?? [];
  chains.forEach((claimed, i) => {
    const pointer = `${base}/claims/chains/${i}`;
    const chain = judgeChain(claimed, pointer, isControlling(claimed));
    if (!chain || claimed.netWidth === undefined) return;
    if (withinTolerance(claimed.netWidth, chain.netWidth, 'length', tolerance)) return;
    const over = claimed.netWidth > chain.netWidth;
    findings.push(
      makeFinding('LG124', {
        ...at,
        severity: over ? 'error' : 'note',
        chain: chain.holes,
        ...(claimed.direction ? { direction: claimed.direction } : {}),
        claimed: claimed.netWidth,
        recomputed: chain.netWidth,
        message: `Claimed net width ${formatQuantity(claimed.netWidth, 'length', u)} of chain ${chain.holes.join('-')} ${over ? 'exceeds' : 'is below'} the recomputed ${formatQuantity(chain.netWidth, 'length', u)}${percentDifference(claimed.netWidth, chain.netWidth)}`,
        pointer: `${pointer}/netWidth`,
      }),
    );
  });

  if (controlling) {
    const listed = chains.some(isControlling);
    const pointer = `${base}/claims/controllingChain`;
    const before = findings.length;
    const chain = listed
      ? tools.defect(controlling.holes)
        ? null
        : tools.of(controlling.holes)
      : judgeChain(controlling, pointer, true);
    const rejected = findings.slice(before).some((f) => f.code === 'LG122' || f.code === 'LG123');
    const ownDirection = controlling.direction;
    const d = result.directions.find((r) => r.direction === (ownDirection ?? result.governingDirection));
    const admissibleHere = chain !== null && d !== undefined && tools.rejection(chain, d.direction) === null;
    if (chain && d?.governing && !rejected && admissibleHere && !sameHoles(chain.holes, d.governing.holes)) {
      const governing = d.governing;
      if (
        chain.netWidth > governing.netWidth &&
        !withinTolerance(chain.netWidth, governing.netWidth, 'length', tolerance)
      ) {
        findings.push(
          makeFinding('LG125', {
            ...at,
            direction: d.direction,
            chain: governing.holes,
            claimed: chain.netWidth,
            recomputed: governing.netWidth,
            message: `Claimed controlling chain ${chain.holes.join('-')} (${formatQuantity(chain.netWidth, 'length', u)}) is not the governing chain ${governing.holes.join('-')} (${formatQuantity(governing.netWidth, 'length', u)}, ${formatDirection(d.direction)})`,
            pointer,
          }),
        );
      }
    }
  }
  return { findings, admissible: admissibleClaims };
}
