/**
 * What the audit works with beyond a member's input (../types.ts): the submitter's claims, the
 * findings it raises and how it is set up. Nothing here depends on how a calc file is written; the
 * calc loader (cli/src/calc) reads a file into these shapes.
 */
import type { CodeProfile, LoadDirection, MemberInput, MemberResult, UnitSystem } from '../types.js';

export type Severity = 'error' | 'warning' | 'note';

/**
 * Finding classes, in the order a checker reads them. `overstated`: the submission claims more area
 * or strength than the recomputation gives (unsafe). `understated`: it claims less (conservative).
 * `missed-chain`: the governing chain was not among those claimed. `phantom-chain`: a claimed chain
 * cannot form for the load direction, or does not exist. `chain-width`: a claimed chain's net width
 * differs. `equal-share`: the equal-share rule falls below the full-load An. `detailing`: hole
 * layout, spacing and edge distance. `input`: the file itself.
 */
export type FindingClass =
  | 'overstated'
  | 'understated'
  | 'missed-chain'
  | 'phantom-chain'
  | 'chain-width'
  | 'equal-share'
  | 'detailing'
  | 'input';

export interface Finding {
  /** Stable code of our own, e.g. `LG101`. */
  readonly code: string;
  /** Stable kebab-case name of the code, e.g. `overstated-net-area`. */
  readonly name: string;
  readonly class: FindingClass;
  readonly severity: Severity;
  readonly memberId?: string;
  readonly direction?: LoadDirection;
  /** Hole ids of the chain concerned, if any. */
  readonly chain?: readonly string[];
  /** Hole ids concerned (detailing). */
  readonly holes?: readonly string[];
  readonly claimed?: number;
  readonly recomputed?: number;
  /** One line an engineer would accept, with the numbers. */
  readonly message: string;
  /** JSON pointer into the calc file of the value the finding is about. */
  readonly pointer: string;
}

/** One entry of the finding catalogue: what a code means, for SARIF rules, docs and the dashboard. */
export interface FindingRule {
  readonly code: string;
  readonly name: string;
  readonly class: FindingClass;
  /** Default severity; some codes are raised or lowered case by case (see `help`). */
  readonly severity: Severity;
  readonly title: string;
  /** Two or three sentences for an engineer. */
  readonly help: string;
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

/** A member as submitted: its input, what the submitter claims for it, and where it sits in its calc. */
export interface CalcMember {
  /** Index in the calc's `members` array; the member's JSON pointer is `/members/{index}`. */
  readonly index: number;
  readonly description?: string;
  readonly input: MemberInput;
  readonly claims?: MemberClaims;
}

/** The part of a calc an audit reads: its code profile and its members (a `CalcDocument` is one). */
export interface AuditedCalc {
  readonly profile: CodeProfile;
  readonly members: readonly CalcMember[];
}

/** Comparison tolerance for claims: the one tolerance type of the engine (see withinTolerance). */
export interface Tolerance {
  /** Relative tolerance, 0.005 = 0.5 %. */
  readonly relative: number;
  /**
   * Absolute tolerances by dimension, in the calc's units; when given they replace `relative` for
   * that dimension.
   */
  readonly absolute?: {
    readonly length?: number;
    readonly area?: number;
    readonly force?: number;
  };
}

/** Options of auditMember and auditCalc. */
export interface AuditOptions {
  /** Default DEFAULT_TOLERANCE (0.5 % relative). */
  readonly tolerance?: Tolerance;
  /** How many least chains to report per direction (default 10). */
  readonly k?: number;
  /** Only these directions (default: the member's own). */
  readonly directions?: readonly LoadDirection[];
}

/** A member recomputed and compared with its claims. */
export interface MemberAudit {
  readonly memberId: string;
  readonly pointer: string;
  readonly result: MemberResult;
  readonly findings: readonly Finding[];
}

/** Every member of a calc, audited under the calc's profile. */
export interface CalcAudit {
  readonly engineVersion: string;
  readonly profile: CodeProfile;
  readonly members: readonly MemberAudit[];
}

/** Where and how the parts of a member's audit place and word their findings. */
export interface AuditScope {
  readonly memberId: string;
  /** The member's JSON pointer (`/members/{index}`); every finding's pointer starts with it. */
  readonly pointer: string;
  readonly units: UnitSystem;
  readonly tolerance: Tolerance;
}
