import type { MemberModel, MemberResult } from '../types.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import { percentDifference } from './percentDifference.js';
import { withinTolerance } from './withinTolerance.js';
import type { AuditScope, Finding } from './types.js';

/**
 * What a result rests on that the file should have said otherwise: a tabulated Ag that differs from
 * the flat elements' beyond the tolerance (LG141: the tabulated value is used, cli/src/engine/sections/
 * README.md §4), and a shear lag factor no rule gave from the connection data (LG142: U taken as 1.0).
 *
 * @param model - the member model (whether the file gives shear lag data, for the pointer)
 * @param result - the member's analysis
 * @param scope - member id, pointer, units and tolerance
 * @returns the findings, LG141 first
 * @example
 * // L4x4x3/8 with Ag 2.95 in² tabulated: the elements give (4 + 4 − 0.375) · 0.375 = 2.86 in²
 * resultBasisFindings(model, result, scope)[0]?.code // → 'LG141'
 */
export function resultBasisFindings(model: MemberModel, result: MemberResult, scope: AuditScope): Finding[] {
  const u = scope.units;
  const findings: Finding[] = [];
  const gross = result.grossArea;
  if (
    gross?.tabulated !== undefined &&
    !withinTolerance(gross.tabulated, gross.fromElements, 'area', scope.tolerance)
  ) {
    findings.push(
      makeFinding('LG141', {
        memberId: scope.memberId,
        claimed: gross.tabulated,
        recomputed: gross.fromElements,
        message: `Tabulated Ag ${formatQuantity(gross.tabulated, 'area', u)} is used; the flat elements give ${formatQuantity(gross.fromElements, 'area', u)}${percentDifference(gross.tabulated, gross.fromElements)}`,
        pointer: `${scope.pointer}/section/Ag`,
      }),
    );
  }
  if (result.shearLag?.notApplicable !== undefined) {
    findings.push(
      makeFinding('LG142', {
        memberId: scope.memberId,
        recomputed: 1,
        message: `Shear lag: ${result.shearLag.notApplicable}; U taken as 1.0`,
        pointer: model.input.shearLag ? `${scope.pointer}/load/shearLag` : `${scope.pointer}/load`,
      }),
    );
  }
  return findings;
}
