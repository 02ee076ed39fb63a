/**
 * What a run of the command line produces, before any formatter turns it into text. Everything here
 * is plain data (no functions, no source text, no parsed documents) so a run over many files only
 * keeps what it reports.
 */
import type { CalcError } from '../calc/types.js';
import type { CodeProfile, LoadDirection, MemberInput, MemberResult, UnitSystem } from '../engine/types.js';
import type { Finding, Severity } from '../engine/findings/types.js';

/** Exit codes of every command: 0 clean, 1 findings at or above `--fail-on`, 2 usage or input error. */
export type ExitCode = 0 | 1 | 2;

/** What a runner hands back to its command: a result for the formatter and the exit code. */
export interface RunOutcome<R> {
  readonly result: R;
  readonly exitCode: ExitCode;
}

/**
 * Which findings make `check` exit 1. `overstated`: any finding of severity error (an overstated
 * claim, a missed governing chain, a phantom controlling chain …); `any`: any warning or error;
 * `none`: never.
 */
export type FailOn = 'overstated' | 'any' | 'none';

/** A finding with the line and column of the value its pointer names. */
export interface LocatedFinding extends Finding {
  readonly line: number;
  readonly column: number;
}

/** One member of a checked file. */
export interface MemberReport {
  readonly memberId: string;
  readonly pointer: string;
  readonly line: number;
  readonly column: number;
  readonly description?: string;
  /** What the reports say about the member itself (the holes stay in the file). */
  readonly plate: MemberSummary;
  readonly result: MemberResult;
  readonly findings: readonly LocatedFinding[];
}

/** The member facts a report prints: kind, plate size, material and how many holes. */
export interface MemberSummary {
  readonly kind: MemberInput['kind'];
  readonly width: number;
  readonly thickness: number;
  readonly material: MemberInput['material'];
  readonly holeCount: number;
}

/** One input file: either checked (members with results) or invalid (errors only). */
export interface FileReport {
  /** Display name: relative to the working directory, `/` separators; `<stdin>` for standard input. */
  readonly file: string;
  readonly status: 'checked' | 'valid' | 'invalid';
  readonly errors: readonly CalcError[];
  readonly project?: string;
  readonly units?: UnitSystem;
  readonly profile?: CodeProfile;
  /** Members in file order (after any `--member` filter). Empty for invalid files and for `validate`. */
  readonly members: readonly MemberReport[];
  /** Members in the file before any filter. */
  readonly memberCount: number;
}

export interface SeverityCounts {
  readonly error: number;
  readonly warning: number;
  readonly note: number;
}

export interface RunSummary {
  readonly files: number;
  readonly invalidFiles: number;
  readonly members: number;
  readonly findings: SeverityCounts;
  /** Findings at or above `--fail-on`. */
  readonly failing: number;
  /** Input errors over all invalid files. */
  readonly inputErrors: number;
}

/** Comparison tolerance as given on the command line, before it is resolved for a file's units. */
export interface CommandLineTolerance {
  readonly relative: number;
  readonly absolute: readonly AbsoluteTolerance[];
}

export type ToleranceDimension = 'length' | 'area' | 'force';

export interface AbsoluteTolerance {
  readonly dimension: ToleranceDimension;
  readonly value: number;
  readonly units: UnitSystem;
  /** As typed, e.g. `0.02in`. */
  readonly text: string;
}

export interface CheckSettings {
  readonly tolerance: CommandLineTolerance;
  readonly failOn: FailOn;
  readonly k: number;
  readonly directions?: readonly LoadDirection[];
  readonly member?: string;
}

/** Everything a `check` or `validate` run reports. */
export interface RunReport {
  readonly command: 'check' | 'validate';
  readonly tool: ToolInfo;
  readonly settings: CheckSettings;
  readonly files: readonly FileReport[];
  readonly summary: RunSummary;
  readonly exitCode: ExitCode;
}

export interface ToolInfo {
  readonly name: 'ligament';
  readonly version: string;
  readonly engineVersion: string;
  readonly schemaVersion: string;
}

/** Severities at or above a fail-on level. */
export function failingSeverities(failOn: FailOn): readonly Severity[] {
  if (failOn === 'overstated') return ['error'];
  if (failOn === 'any') return ['error', 'warning'];
  return [];
}
