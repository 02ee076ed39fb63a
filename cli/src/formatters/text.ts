/**
 * Human-readable report: one block per file and member with aligned columns, findings as
 * `file:line:col  SEVERITY CODE message  pointer`, then the totals. Pure: colours come in as functions.
 */
import type { CalcError } from '../calc/types.js';
import type { MemberReport, RunReport, FileReport, LocatedFinding } from '../runner/types.js';
import { CAUTION } from '../engine/caution.js';
import { codeLabel, formatQuantity, unitSymbol, type Dimension } from '../engine/index.js';
import {
  chainLabel,
  columns,
  fileUnits,
  isFailing,
  position,
  strengthSymbol,
  totalsLine,
  verdictLine,
} from './common.js';

/** The colour functions the text formatter uses (picocolors' shape); identity functions for none. */
export interface Paint {
  readonly bold: (s: string) => string;
  readonly dim: (s: string) => string;
  readonly red: (s: string) => string;
  readonly yellow: (s: string) => string;
  readonly cyan: (s: string) => string;
  readonly green: (s: string) => string;
}

const same = (s: string): string => s;
export const NO_PAINT: Paint = { bold: same, dim: same, red: same, yellow: same, cyan: same, green: same };

export interface TextOptions {
  readonly paint?: Paint;
  /** Only failing findings, input errors and the totals. */
  readonly quiet?: boolean;
}

/** Member kinds drawn and described as one flat plate; sections are shown by their unfolded width. */
const PLATE_KINDS = new Set(['plate', 'splice-plate', 'gusset']);

function severityLabel(severity: string, paint: Paint): string {
  const label = severity.toUpperCase().padEnd(7);
  if (severity === 'error') return paint.red(label);
  if (severity === 'warning') return paint.yellow(label);
  return paint.cyan(label);
}

/** `file:line:col  ERROR   LG101 message  /pointer`. */
export function findingLine(file: string, f: LocatedFinding, paint: Paint = NO_PAINT): string {
  return `${paint.dim(position(file, f.line, f.column))}  ${severityLabel(f.severity, paint)} ${paint.bold(f.code)} ${f.message}  ${paint.dim(f.pointer || '/')}`;
}

/** `file:line:col  ERROR   type message  /pointer` for an input error. */
export function errorLine(e: CalcError, paint: Paint = NO_PAINT): string {
  return `${paint.dim(position(e.file, e.line, e.column))}  ${severityLabel('error', paint)} ${paint.bold(e.rule)} ${e.message}  ${paint.dim(e.pointer || '/')}`;
}

function memberBlock(file: FileReport, m: MemberReport, report: RunReport, paint: Paint): string[] {
  const units = fileUnits(file);
  /** A value with its unit, and (in a column headed by the unit) without. */
  const q = (value: number, dimension: Dimension) => formatQuantity(value, dimension, units);
  const n = (value: number, dimension: Dimension) => formatQuantity(value, dimension, units, { unit: false });
  const r = m.result;
  const input = m.plate;
  const out: string[] = [];
  const grade = input.material.grade ? `  ${input.material.grade}` : '';
  out.push(
    `  ${paint.bold(m.memberId)}  ${input.kind}  ${PLATE_KINDS.has(input.kind) ? 'PL' : 'unfolded'} ${n(input.thickness, 'length')} × ${q(input.width, 'length')}${grade}  ${input.holeCount} holes`,
  );
  const rows: string[][] = [
    [
      'dir',
      'governing chain',
      `wn ${unitSymbol('length', units)}`,
      `An ${unitSymbol('area', units)}`,
      'equal share',
    ],
  ];
  for (const d of r.directions) {
    const share = d.share
      ? `${chainLabel(d.share.chain.holes)} ${d.share.fastenersCarried}/${d.share.fastenersTotal} → ${q(d.share.equivalentArea, 'area')}`
      : '—';
    rows.push([
      d.direction,
      d.governing ? chainLabel(d.governing.holes) : 'none (no chain can form)',
      d.governing ? n(d.governing.netWidth, 'length') : '—',
      n(d.An, 'area'),
      share,
    ]);
  }
  for (const line of columns(rows, ['left', 'left', 'right', 'right', 'left'])) out.push(`    ${line}`);
  const sym = strengthSymbol(file.profile);
  const cap = r.capped ? ' (0.85 Ag cap)' : '';
  const util = r.utilisation !== undefined ? `   utilisation ${q(r.utilisation, 'ratio')}` : '';
  out.push(
    `    Ag ${q(r.Ag, 'area')}   An ${q(r.An, 'area')} (${r.governingDirection})   U ${q(r.U, 'ratio')}   Ae ${q(r.Ae, 'area')}${cap}`,
  );
  const netArea = r.shearLag?.netArea;
  if (netArea) {
    out.push(`    Ae = U × ${q(netArea.area, 'area')}, not U × An (${netArea.clause}: ${netArea.basis})`);
  }
  out.push(
    `    ${sym} yielding ${q(r.yielding.available, 'force')}   rupture ${q(r.rupture.available, 'force')}   governs ${r.governing.limitState} ${q(r.governing.available, 'force')}${util}`,
  );
  const bs = r.blockShear;
  if (bs) {
    out.push(
      `    block shear (${bs.direction}, ${bs.clause}) ${q(bs.available, 'force')}   Agv ${n(bs.Agv, 'area')}  Anv ${n(bs.Anv, 'area')}  Agt ${n(bs.Agt, 'area')}  Ant ${q(bs.Ant, 'area')}${bs.projectDefined ? '   (staggered tension plane: project-defined)' : ''}`,
    );
  }
  const shown = m.findings;
  if (shown.length === 0) out.push(`    ${paint.green('no findings')}`);
  for (const f of shown) out.push(`    ${findingLine(file.file, f, paint)}`);
  return out;
}

function fileHeader(file: FileReport): string {
  const parts: string[] = [];
  if (file.project) parts.push(file.project);
  if (file.profile) parts.push(codeLabel(file.profile));
  if (file.units) parts.push(file.units);
  return parts.length > 0 ? `${file.file}  (${parts.join(' · ')})` : file.file;
}

/**
 * Formats a run as text.
 *
 * @example
 * formatText(report) // → 'calc.json  (Harbour Lantern Footbridge · AISC 360-22 LRFD · in)\n  SP-1 …'
 */
export function formatText(report: RunReport, options: TextOptions = {}): string {
  const paint = options.paint ?? NO_PAINT;
  const lines: string[] = [];
  for (const file of report.files) {
    if (options.quiet) {
      for (const e of file.errors) lines.push(errorLine(e, paint));
      for (const m of file.members)
        for (const f of m.findings)
          if (isFailing(report, f.severity)) lines.push(findingLine(file.file, f, paint));
      continue;
    }
    lines.push(paint.bold(fileHeader(file)));
    if (file.status === 'invalid') {
      lines.push(
        `  ${paint.red('invalid')}: ${file.errors.length === 1 ? '1 error' : `${file.errors.length} errors`}`,
      );
      for (const e of file.errors) lines.push(`    ${errorLine(e, paint)}`);
    } else if (file.status === 'valid') {
      lines.push(
        `  ${paint.green('valid')}: ${file.memberCount === 1 ? '1 member' : `${file.memberCount} members`}`,
      );
    } else {
      if (file.members.length === 0) lines.push(`  ${paint.dim('no member selected')}`);
      for (const m of file.members) lines.push(...memberBlock(file, m, report, paint));
    }
    lines.push('');
  }
  lines.push(paint.bold(totalsLine(report)));
  lines.push(verdictLine(report));
  if (!options.quiet && report.command === 'check') lines.push(paint.dim(CAUTION));
  return lines.join('\n') + '\n';
}
