import { auditCalc, ENGINE_VERSION } from '../engine/index.js';
import { loadCalcText, SCHEMA_VERSION } from '../calc/index.js';
import type { CalcError, CalcDocument, LoadResult } from '../calc/types.js';
import type { Source } from './source.js';
import { resolveTolerance } from './tolerance.js';
import {
  failingSeverities,
  type CheckSettings,
  type ExitCode,
  type FileReport,
  type LocatedFinding,
  type MemberReport,
  type RunOutcome,
  type RunReport,
  type RunSummary,
  type ToolInfo,
} from './types.js';
import type { Severity } from '../engine/findings/types.js';

export interface RunContext {
  readonly command: 'check' | 'validate';
  readonly settings: CheckSettings;
  /** Package version of the running CLI. */
  readonly version: string;
  /**
   * Keep each direction's k least chains and the per-hole widths in the report (default true).
   * Only the JSON result document prints them; the other formats drop them as each file is done,
   * so a long run holds little per file.
   */
  readonly keepDetail?: boolean;
}

/** The tool block of every report. */
export function toolInfo(version: string): ToolInfo {
  return { name: 'ligament', version, engineVersion: ENGINE_VERSION, schemaVersion: SCHEMA_VERSION };
}

function invalid(file: string, errors: readonly CalcError[], memberCount = 0): FileReport {
  return { file, status: 'invalid', errors, members: [], memberCount };
}

function errorMessage(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}

/** Loads a source's text, turning an empty file or a loader crash into a CalcError. */
export function loadSource(source: Source): LoadResult {
  if ('error' in source) return { ok: false, file: source.file, errors: [source.error] };
  const text = source.text.charCodeAt(0) === 0xfeff ? source.text.slice(1) : source.text;
  if (text.trim() === '') {
    return {
      ok: false,
      file: source.file,
      errors: [
        {
          file: source.file,
          pointer: '',
          line: 1,
          column: 1,
          rule: 'empty-file',
          message: 'the file is empty: expected a ligament-calc JSON document',
        },
      ],
    };
  }
  try {
    return loadCalcText(text, source.file);
  } catch (err) {
    return {
      ok: false,
      file: source.file,
      errors: [
        { file: source.file, pointer: '', line: 1, column: 1, rule: 'load', message: errorMessage(err) },
      ],
    };
  }
}

function selectMembers(doc: CalcDocument, member: string | undefined): CalcDocument {
  if (member === undefined) return doc;
  return { ...doc, members: doc.members.filter((m) => m.input.id === member) };
}

/**
 * Checks one source: load, validate, recompute every member and compare its claims. Pure: the
 * document and the text are dropped once the file's report is built.
 */
export function checkSource(source: Source, ctx: RunContext): FileReport {
  const loaded = loadSource(source);
  if (!loaded.ok) return invalid(loaded.file, loaded.errors);
  const doc = loaded.document;
  const base = {
    file: loaded.file,
    errors: [],
    project: doc.meta.project,
    units: doc.profile.units,
    profile: doc.profile,
    memberCount: doc.members.length,
  };
  if (ctx.command === 'validate') return { ...base, status: 'valid', members: [] };

  const selected = selectMembers(doc, ctx.settings.member);
  let audit;
  try {
    audit = auditCalc(selected, {
      tolerance: resolveTolerance(ctx.settings.tolerance, doc.profile.units),
      k: ctx.settings.k,
      ...(ctx.settings.directions ? { directions: ctx.settings.directions } : {}),
    });
  } catch (err) {
    return invalid(loaded.file, [
      { file: loaded.file, pointer: '', line: 1, column: 1, rule: 'engine', message: errorMessage(err) },
    ]);
  }
  const byPointer = new Map(selected.members.map((m) => [`/members/${m.index}`, m]));
  const members: MemberReport[] = audit.members.map((m, i) => {
    const calcMember = byPointer.get(m.pointer) ?? selected.members[i];
    if (!calcMember) throw new Error(`the engine reported member ${m.memberId} that the file does not hold`);
    const at = loaded.locate(m.pointer);
    const findings: LocatedFinding[] = m.findings.map((f) => ({ ...f, ...loaded.locate(f.pointer) }));
    return {
      memberId: m.memberId,
      pointer: m.pointer,
      line: at.line,
      column: at.column,
      ...(calcMember.description !== undefined ? { description: calcMember.description } : {}),
      plate: {
        kind: calcMember.input.kind,
        width: calcMember.input.width,
        thickness: calcMember.input.thickness,
        material: calcMember.input.material,
        holeCount: calcMember.input.holes.length,
      },
      result:
        ctx.keepDetail === false
          ? {
              ...m.result,
              holeWidths: [],
              directions: m.result.directions.map((d) => ({ ...d, leastChains: [] })),
            }
          : m.result,
      findings,
    };
  });
  return { ...base, status: 'checked', members };
}

function countSeverities(files: readonly FileReport[]): Record<Severity, number> {
  const counts: Record<Severity, number> = { error: 0, warning: 0, note: 0 };
  for (const f of files) for (const m of f.members) for (const x of m.findings) counts[x.severity] += 1;
  return counts;
}

/** Totals for a set of file reports under a fail-on level. */
export function summarise(files: readonly FileReport[], settings: CheckSettings): RunSummary {
  const findings = countSeverities(files);
  const failingSet = new Set(failingSeverities(settings.failOn));
  let failing = 0;
  for (const s of failingSet) failing += findings[s];
  return {
    files: files.length,
    invalidFiles: files.filter((f) => f.status === 'invalid').length,
    members: files.reduce((n, f) => n + f.members.length, 0),
    findings,
    failing,
    inputErrors: files.reduce((n, f) => n + f.errors.length, 0),
  };
}

/** 2 when any input was invalid, else 1 when any finding is at or above `--fail-on`, else 0. */
export function exitCodeFor(summary: RunSummary): ExitCode {
  if (summary.invalidFiles > 0) return 2;
  return summary.failing > 0 ? 1 : 0;
}

/** Things the command prints to stderr after the run (the report itself goes to stdout). */
export function runDiagnostics(report: RunReport): string[] {
  const out: string[] = [];
  const { member } = report.settings;
  if (
    member !== undefined &&
    report.summary.invalidFiles < report.summary.files &&
    report.summary.members === 0
  ) {
    out.push(
      `no member "${member}" in ${report.summary.files === 1 ? 'the file' : 'any of the files'} checked`,
    );
  }
  if (report.summary.files === 0) out.push('no calc files found');
  return out;
}

/**
 * Runs `check` (or `validate`) over sources one at a time, so only the per-file reports are held.
 * Exit code: see {@link exitCodeFor}; a `--member` that matches nothing, or no files at all, is a
 * usage error (2).
 */
export async function runCheck(
  sources: AsyncIterable<Source> | Iterable<Source>,
  ctx: RunContext,
  onFile?: (report: FileReport) => void,
): Promise<RunOutcome<RunReport>> {
  const files: FileReport[] = [];
  for await (const source of sources) {
    const report = checkSource(source, ctx);
    files.push(report);
    onFile?.(report);
  }
  const summary = summarise(files, ctx.settings);
  const draft: RunReport = {
    command: ctx.command,
    tool: toolInfo(ctx.version),
    settings: ctx.settings,
    files,
    summary,
    exitCode: exitCodeFor(summary),
  };
  const exitCode: ExitCode = runDiagnostics(draft).length > 0 ? 2 : draft.exitCode;
  return { result: { ...draft, exitCode }, exitCode };
}
