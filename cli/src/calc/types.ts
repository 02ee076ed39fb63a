/**
 * The calc file as the rest of Ligament sees it once it has been read, validated and normalised:
 * every length a number in the file's unit system, bolt sizes as diameters, hole dimensions resolved.
 * The on-disk shape is defined by schema/calc.schema.json (format `ligament-calc`).
 */
import type { CalcMember } from '../engine/findings/types.js';
import type { CodeProfile } from '../engine/types.js';

// The member and claim types a document is made of belong to the engine (it audits them); they are
// named here too, for readers of the calc loader's API.
export type { CalcMember, ClaimedChain, MemberClaims } from '../engine/findings/types.js';

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
