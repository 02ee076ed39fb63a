import { analyseModel } from '../analyseModel.js';
import { memberModel } from '../member/memberModel.js';
import { detailingFindings } from './detailingFindings.js';
import { grazingFindings } from './grazingFindings.js';
import { formatDirection } from './formatDirection.js';
import { formatQuantity, type Dimension } from './formatQuantity.js';
import { inspectLayout } from '../holes/inspectLayout.js';
import { makeFinding } from './makeFinding.js';
import { memberChainTools } from '../member/memberChainTools.js';
import { profileDetailingFindings } from './profileDetailingFindings.js';
import { sectionDetailingFindings } from './sectionDetailingFindings.js';
import { withinTolerance, DEFAULT_TOLERANCE } from './withinTolerance.js';
import type { Chain, CodeProfile, LoadDirection, MemberBlockOutline, MemberResult } from '../types.js';
import type {
  AuditOptions,
  CalcMember,
  ClaimedChain,
  Finding,
  FindingClass,
  MemberAudit,
  MemberClaims,
  Tolerance,
} from './types.js';

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

const CLASS_ORDER: readonly FindingClass[] = [
  'input',
  'overstated',
  'missed-chain',
  'phantom-chain',
  'chain-width',
  'equal-share',
  'understated',
  'detailing',
];

function percent(claimed: number, recomputed: number): string {
  if (recomputed === 0) return '';
  return ` by ${((Math.abs(claimed - recomputed) / Math.abs(recomputed)) * 100).toFixed(1)} %`;
}

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
      // The least of yielding, rupture and block shear (analyseMember).
      return result.governing.available;
  }
}

function sameHoles(a: readonly string[], b: readonly string[]): boolean {
  return a.length === b.length && a.every((id, i) => id === b[i]);
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
 * Audits one member of a calc file: recomputes it from its input (never trusting a claim) and
 * compares every claimed number, classifying each difference by what it means for safety
 * (cli/docs/method.md §8, codes in FINDING_CATALOGUE): overstated claims (LG101–LG105, errors),
 * understated ones (LG111–LG115, notes), claimed chains that do not exist (LG123) or cannot form
 * (LG122), claimed net widths that differ (LG124), a governing chain missing from the claimed chains
 * (LG121) or a controlling chain that is not the governing one (LG125), the equal-share check
 * (LG131), detailing (LG201–LG203) and layout input problems (LG301–LG303).
 *
 * @param calcMember - the member as read from the calc file, with its claims and index
 * @param profile - code edition, method and units of the file
 * @param options - tolerance (default 0.5 % relative), k least chains (10), directions
 * @returns the result and the findings, ordered input, overstated, missed, phantom, chain width,
 *   equal share, understated, detailing
 * @throws EngineError when a hole's bolt size is not in the hole table (the loader rejects such files)
 * @example
 * // D.9 claimed with An 6.10 in² and only the straight chain: LG101 and LG121
 * auditMember(member, profile).findings.map((f) => f.code) // → ['LG101', 'LG121', …]
 */
export function auditMember(
  calcMember: CalcMember,
  profile: CodeProfile,
  options: AuditOptions = {},
): MemberAudit {
  const member = calcMember.input;
  const base = `/members/${calcMember.index}`;
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const u = profile.units;
  // The member is built once; the analysis, the claimed-chain tools, grazing and detailing share it.
  const model = memberModel(member, profile);
  const result = analyseModel(model, {
    k: options.k ?? 10,
    ...(options.directions ? { directions: options.directions } : {}),
  });
  const directions = result.directions.map((d) => d.direction);
  const tools = memberChainTools(model);
  const findings: Finding[] = [];
  const at = { memberId: member.id };

  // A section's holes are placed by element and gauge; the loader reports those outside (LG304).
  const issues = inspectLayout(member, profile).filter((i) => !member.section || i.code === 'LG303');
  for (const issue of issues) {
    findings.push(
      makeFinding(issue.code, {
        ...at,
        holes: issue.holes,
        message: issue.message,
        pointer: base + issue.pointer,
      }),
    );
  }

  const claims = calcMember.claims ?? {};
  const outline = claimedOutline(result, claims, tolerance);
  for (const { key, codes, dimension, label } of SCALARS) {
    const claimed = claims[key];
    if (claimed === undefined) continue;
    const recomputed = recomputedScalar(key, result, outline);
    if (recomputed === undefined) continue;
    if (withinTolerance(claimed, recomputed, dimension, tolerance)) continue;
    const over = claimed > recomputed;
    findings.push(
      makeFinding(over ? codes[0] : codes[1], {
        ...at,
        claimed,
        recomputed,
        message: `Claimed ${label} ${formatQuantity(claimed, dimension, u)} ${over ? 'exceeds' : 'is below'} the recomputed ${formatQuantity(recomputed, dimension, u)}${context(result, key, outline)}${percent(claimed, recomputed)}`,
        pointer: `${base}/claims/${key}`,
      }),
    );
  }

  // Claimed chains: existence, admissibility, net width.
  const controlling = claims.controllingChain;
  const isControlling = (c: ClaimedChain): boolean =>
    controlling !== undefined &&
    sameHoles(c.holes, controlling.holes) &&
    (c.direction === undefined ||
      controlling.direction === undefined ||
      c.direction === controlling.direction);
  const admissibleClaims: { chain: Chain; directions: readonly LoadDirection[]; claimed: ClaimedChain }[] =
    [];
  const checkChain = (claimed: ClaimedChain, pointer: string, controllingClaim: boolean): Chain | null => {
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
    const chain = checkChain(claimed, pointer, isControlling(claimed));
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
        message: `Claimed net width ${formatQuantity(claimed.netWidth, 'length', u)} of chain ${chain.holes.join('-')} ${over ? 'exceeds' : 'is below'} the recomputed ${formatQuantity(chain.netWidth, 'length', u)}${percent(claimed.netWidth, chain.netWidth)}`,
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
      : checkChain(controlling, pointer, true);
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

  // Missed chain: the governing chain of a direction is not among the chains claimed.
  if (claims.chains) {
    const claimedLeast = admissibleClaims.length
      ? Math.min(...admissibleClaims.map((c) => (c.claimed.netWidth ?? c.chain.netWidth) * member.thickness))
      : undefined;
    const reference = claims.An ?? claimedLeast;
    for (const d of result.directions) {
      const governing = d.governing;
      if (!governing) continue;
      const covered = admissibleClaims.some(
        (c) =>
          c.directions.includes(d.direction) &&
          (sameHoles(c.chain.holes, governing.holes) ||
            c.chain.netWidth <= governing.netWidth + 1e-9 * Math.max(1, Math.abs(governing.netWidth))),
      );
      if (covered) continue;
      const below =
        reference === undefined ||
        (governing.netArea < reference && !withinTolerance(reference, governing.netArea, 'area', tolerance));
      findings.push(
        makeFinding('LG121', {
          ...at,
          severity: below ? 'error' : 'warning',
          direction: d.direction,
          chain: governing.holes,
          recomputed: governing.netArea,
          ...(reference !== undefined ? { claimed: reference } : {}),
          message: `Governing chain ${governing.holes.join('-')} for ${formatDirection(d.direction)} (net width ${formatQuantity(governing.netWidth, 'length', u)}, An ${formatQuantity(governing.netArea, 'area', u)}) is not among the claimed chains${reference !== undefined ? `; claimed An ${formatQuantity(reference, 'area', u)}` : ''}`,
          pointer: `${base}/claims/chains`,
        }),
      );
    }
  }

  // Equal-share check (cli/docs/method.md §4).
  for (const d of result.directions) {
    const share = d.share;
    if (!share || !(share.equivalentArea < d.An * (1 - 1e-9))) continue;
    findings.push(
      makeFinding('LG131', {
        ...at,
        direction: d.direction,
        chain: share.chain.holes,
        claimed: d.An,
        recomputed: share.equivalentArea,
        message: `Equal-share check for ${formatDirection(d.direction)}: chain ${share.chain.holes.join('-')} carries ${share.fastenersCarried} of ${share.fastenersTotal} fasteners; An/share ${formatQuantity(share.equivalentArea, 'area', u)} is below the full-load An ${formatQuantity(d.An, 'area', u)}`,
        pointer: `${base}/holes`,
      }),
    );
  }

  // Block shear below the tensile strengths, neither claimed nor allowed for in `available`.
  const block = result.blockShear;
  const tensile = result.rupture.available < result.yielding.available ? result.rupture : result.yielding;
  if (block && result.governing.limitState === 'block shear') {
    // A claimed `available` is compared with the lesser of the two (LG103/LG113) instead.
    if (claims.available === undefined && claims.blockShear === undefined) {
      findings.push(
        makeFinding('LG132', {
          ...at,
          direction: block.direction,
          recomputed: block.available,
          message: `Block shear ${formatQuantity(block.available, 'force', u)} (${block.clause}${block.projectDefined ? ', staggered tension plane: project-defined' : ''}) is below the tensile ${tensile.limitState} strength ${formatQuantity(tensile.available, 'force', u)}`,
          pointer: `${base}/blockShear`,
        }),
      );
    }
  }

  // Tabulated gross area against the elements (LG141), shear lag without a rule (LG142).
  const gross = result.grossArea;
  if (
    gross?.tabulated !== undefined &&
    !withinTolerance(gross.tabulated, gross.fromElements, 'area', tolerance)
  ) {
    findings.push(
      makeFinding('LG141', {
        ...at,
        claimed: gross.tabulated,
        recomputed: gross.fromElements,
        message: `Tabulated Ag ${formatQuantity(gross.tabulated, 'area', u)} is used; the flat elements give ${formatQuantity(gross.fromElements, 'area', u)}${percent(gross.tabulated, gross.fromElements)}`,
        pointer: `${base}/section/Ag`,
      }),
    );
  }
  if (result.shearLag?.notApplicable !== undefined) {
    findings.push(
      makeFinding('LG142', {
        ...at,
        recomputed: 1,
        message: `Shear lag: ${result.shearLag.notApplicable}; U taken as 1.0`,
        pointer: member.shearLag ? `${base}/load/shearLag` : `${base}/load`,
      }),
    );
  }

  if (profile.standard === 'EN 1993-1-1' || profile.standard === 'CSA S16-19') {
    findings.push(...profileDetailingFindings(model, base));
  } else if (member.section) {
    findings.push(...sectionDetailingFindings(model, base));
  } else {
    findings.push(...detailingFindings(model, base));
  }
  // The grazing check is geometric, not a code rule: made on every member under every profile.
  findings.push(...grazingFindings(model, result, base));

  const rank = new Map(CLASS_ORDER.map((c, i) => [c, i] as const));
  const ordered = findings
    .map((f, i) => ({ f, i }))
    .sort((a, b) => rank.get(a.f.class)! - rank.get(b.f.class)! || a.i - b.i)
    .map((e) => e.f);
  return { memberId: member.id, pointer: base, result, findings: ordered };
}
