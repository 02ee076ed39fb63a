/**
 * The JSON result document (format `ligament-result` 1.0, described by schema/result.schema.json).
 * It is built field by field, not dumped from the engine's objects, so its shape only changes with
 * its own version.
 */
import type { CalcError } from '../calc/types.js';
import { codeLabel } from '../engine/strength/codeLabel.js';
import { designMethodOf } from '../engine/strength/designMethodOf.js';
import type { Chain, DirectionResult, Strength } from '../engine/types.js';
import type { FileReport, LocatedFinding, MemberReport, RunReport } from '../runner/types.js';
import { CAUTION } from '../engine/caution.js';

export const RESULT_SCHEMA_ID = 'urn:ligament:schema:result:1.0';
export const RESULT_FORMAT_VERSION = '1.0';

function chain(c: Chain) {
  return {
    holes: [...c.holes],
    legs: c.legs.map((l) => ({ from: l.from, to: l.to, s: l.s, g: l.g, term: l.term })),
    deducted: c.deducted,
    staggerSum: c.staggerSum,
    netWidth: c.netWidth,
    netArea: c.netArea,
  };
}

function strength(s: Strength) {
  return { limitState: s.limitState, nominal: s.nominal, factor: s.factor, available: s.available };
}

function direction(d: DirectionResult) {
  return {
    direction: d.direction,
    governing: d.governing ? chain(d.governing) : null,
    An: d.An,
    leastChains: d.leastChains.map(chain),
    share: d.share
      ? {
          chain: chain(d.share.chain),
          fastenersCarried: d.share.fastenersCarried,
          fastenersTotal: d.share.fastenersTotal,
          share: d.share.share,
          equivalentArea: d.share.equivalentArea,
        }
      : null,
  };
}

function finding(f: LocatedFinding) {
  return {
    code: f.code,
    name: f.name,
    class: f.class,
    severity: f.severity,
    message: f.message,
    pointer: f.pointer,
    line: f.line,
    column: f.column,
    ...(f.memberId !== undefined ? { memberId: f.memberId } : {}),
    ...(f.direction !== undefined ? { direction: f.direction } : {}),
    ...(f.chain !== undefined ? { chain: [...f.chain] } : {}),
    ...(f.holes !== undefined ? { holes: [...f.holes] } : {}),
    ...(f.claimed !== undefined ? { claimed: f.claimed } : {}),
    ...(f.recomputed !== undefined ? { recomputed: f.recomputed } : {}),
  };
}

function inputError(e: CalcError) {
  return { pointer: e.pointer, line: e.line, column: e.column, rule: e.rule, message: e.message };
}

function member(m: MemberReport) {
  const r = m.result;
  return {
    id: m.memberId,
    pointer: m.pointer,
    line: m.line,
    column: m.column,
    kind: m.plate.kind,
    width: m.plate.width,
    thickness: m.plate.thickness,
    result: {
      Ag: r.Ag,
      An: r.An,
      governingDirection: r.governingDirection,
      U: r.U,
      Ae: r.Ae,
      capped: r.capped,
      holeWidths: r.holeWidths.map((h) => ({
        holeId: h.holeId,
        nominalAcross: h.nominalAcross,
        nominalAlong: h.nominalAlong,
        allowance: h.allowance,
        deducted: h.deducted,
        source: h.source,
      })),
      directions: r.directions.map(direction),
      yielding: strength(r.yielding),
      rupture: strength(r.rupture),
      governing: strength(r.governing),
      ...(r.utilisation !== undefined ? { utilisation: r.utilisation } : {}),
      ...(r.clauses ? { clauses: { yielding: r.clauses.yielding, rupture: r.clauses.rupture } } : {}),
      ...(r.shearLag
        ? {
            shearLag: {
              U: r.shearLag.U,
              rule: r.shearLag.rule,
              basis: r.shearLag.basis,
              ...(r.shearLag.notApplicable ? { notApplicable: r.shearLag.notApplicable } : {}),
              ...(r.shearLag.netArea
                ? {
                    netArea: {
                      area: r.shearLag.netArea.area,
                      clause: r.shearLag.netArea.clause,
                      basis: r.shearLag.netArea.basis,
                    },
                  }
                : {}),
            },
          }
        : {}),
      ...(r.blockShear
        ? {
            blockShear: {
              direction: r.blockShear.direction,
              Agv: r.blockShear.Agv,
              Anv: r.blockShear.Anv,
              Agt: r.blockShear.Agt,
              Ant: r.blockShear.Ant,
              nominal: r.blockShear.nominal,
              factor: r.blockShear.factor,
              available: r.blockShear.available,
              clause: r.blockShear.clause,
              projectDefined: r.blockShear.projectDefined,
              parts: r.blockShear.parts.map((p) => ({
                element: p.element,
                kind: p.kind,
                tensionHoles: [...p.tensionHoles],
                staggerSum: p.staggerSum,
                source: p.source,
                available: p.available,
              })),
            },
          }
        : {}),
    },
    findings: m.findings.map(finding),
  };
}

function file(f: FileReport) {
  return {
    file: f.file,
    status: f.status,
    ...(f.project !== undefined ? { project: f.project } : {}),
    ...(f.units !== undefined ? { units: f.units } : {}),
    ...(f.profile !== undefined
      ? {
          code: {
            standard: f.profile.standard,
            method: designMethodOf(f.profile),
            label: codeLabel(f.profile),
          },
        }
      : {}),
    memberCount: f.memberCount,
    errors: f.errors.map(inputError),
    members: f.members.map(member),
  };
}

/** The result document as a plain object (see schema/result.schema.json). */
export function resultDocument(report: RunReport) {
  const s = report.settings;
  return {
    $schema: RESULT_SCHEMA_ID,
    format: 'ligament-result' as const,
    formatVersion: RESULT_FORMAT_VERSION,
    command: report.command,
    tool: { ...report.tool },
    settings: {
      tolerance: {
        relative: s.tolerance.relative,
        absolute: s.tolerance.absolute.map((a) => ({
          dimension: a.dimension,
          value: a.value,
          units: a.units,
        })),
      },
      failOn: s.failOn,
      k: s.k,
      ...(s.directions ? { directions: [...s.directions] } : {}),
      ...(s.member !== undefined ? { member: s.member } : {}),
    },
    files: report.files.map(file),
    summary: {
      files: report.summary.files,
      invalidFiles: report.summary.invalidFiles,
      members: report.summary.members,
      inputErrors: report.summary.inputErrors,
      findings: { ...report.summary.findings },
      failing: report.summary.failing,
    },
    exitCode: report.exitCode,
    caution: CAUTION,
  };
}

export type ResultDocument = ReturnType<typeof resultDocument>;

/** Formats a run as the JSON result document, two-space indented. */
export function formatJson(report: RunReport): string {
  return JSON.stringify(resultDocument(report), null, 2) + '\n';
}
