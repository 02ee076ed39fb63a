/**
 * The calc file as the rest of Ligament sees it once it has been read, validated and normalised:
 * every length a number in the file's unit system, bolt sizes as diameters, hole dimensions resolved.
 * The on-disk shape is defined by schema/calc.schema.json (format `ligament-calc`).
 */
import type { CodeProfile, LoadDirection, MemberInput, Finding, MemberResult } from '../engine/types.js';

export interface CalcMeta {
  readonly project: string;
  readonly preparedBy: string;
  readonly firm?: string;
  /** ISO date, YYYY-MM-DD. */
  readonly date: string;
  readonly tool?: { readonly name: string; readonly version?: string };
  readonly reference?: string;
  readonly notes?: string;
}

/** A chain the submitter says was checked. */
export interface ClaimedChain {
  readonly holes: readonly string[];
  readonly netWidth?: number;
  readonly direction?: LoadDirection;
}

/** The submitter's claimed results for a member. All optional; only what is claimed is compared. */
export interface MemberClaims {
  readonly chains?: readonly ClaimedChain[];
  readonly controllingChain?: ClaimedChain;
  readonly Ag?: number;
  readonly An?: number;
  readonly U?: number;
  readonly Ae?: number;
  /** Available (design or allowable) tensile yielding strength. */
  readonly yielding?: number;
  /** Available tensile rupture strength. */
  readonly rupture?: number;
  /** Governing available strength. */
  readonly available?: number;
  /** Block shear: gross and net shear areas, gross and net tension areas of the governing tear-out. */
  readonly Agv?: number;
  readonly Anv?: number;
  readonly Agt?: number;
  readonly Ant?: number;
  /** Available block shear strength (φRn, Rn/Ω, Veff,Rd or Tr). */
  readonly blockShear?: number;
}

export interface CalcMember {
  /** Index in the file's `members` array; the member's JSON pointer is `/members/{index}`. */
  readonly index: number;
  readonly description?: string;
  readonly input: MemberInput;
  readonly claims?: MemberClaims;
}

export interface CalcDocument {
  readonly format: 'ligament-calc';
  /** Format version, `MAJOR.MINOR`. */
  readonly formatVersion: string;
  readonly meta: CalcMeta;
  readonly profile: CodeProfile;
  readonly members: readonly CalcMember[];
}

/** One thing wrong with a calc file: always names file, pointer, position and rule. */
export interface CalcError {
  readonly file: string;
  /** JSON pointer (RFC 6901) of the offending value; "" for the whole document. */
  readonly pointer: string;
  /** 1-based line and column of the offending value in the source text. */
  readonly line: number;
  readonly column: number;
  /** The rule broken: a JSON Schema keyword (`type`, `required`, …), `json-syntax`, or a semantic rule name. */
  readonly rule: string;
  readonly message: string;
}

export interface SourcePosition {
  readonly line: number;
  readonly column: number;
}

export type LoadResult =
  | {
      readonly ok: true;
      readonly file: string;
      readonly document: CalcDocument;
      /** Line and column of the value at a JSON pointer (the nearest existing ancestor if absent). */
      readonly locate: (pointer: string) => SourcePosition;
    }
  | { readonly ok: false; readonly file: string; readonly errors: readonly CalcError[] };

/** Comparison tolerance for claims. */
export interface Tolerance {
  /** Relative tolerance, 0.005 = 0.5 %. */
  readonly relative: number;
  /** Absolute tolerances by dimension, in the calc file's units; when given they replace `relative` for that dimension. */
  readonly absolute?: {
    readonly length?: number;
    readonly area?: number;
    readonly force?: number;
  };
}

export interface AuditOptions {
  readonly tolerance?: Tolerance;
  /** How many least chains to report per direction (default 10). */
  readonly k?: number;
  /** Only these directions (default: the member's own). */
  readonly directions?: readonly LoadDirection[];
}

export interface MemberAudit {
  readonly memberId: string;
  readonly pointer: string;
  readonly result: MemberResult;
  readonly findings: readonly Finding[];
}

export interface CalcAudit {
  readonly engineVersion: string;
  readonly profile: CodeProfile;
  readonly members: readonly MemberAudit[];
}
