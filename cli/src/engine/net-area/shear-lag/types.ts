/**
 * Shear lag (AISC 360 Table D3.1) for members made of flat elements. Lengths in the calc file's unit.
 */

/** The shape class Table D3.1 sorts members by. */
export type ShearLagShape = 'W' | 'M' | 'S' | 'HP' | 'tee' | 'single-angle' | 'double-angle' | 'other';

/** Which element carries the fasteners. */
export type ConnectedElement = 'flange' | 'web' | 'leg' | 'other';

/** Connection data the shear lag factor is found from. */
export interface ShearLagInput {
  readonly shape: ShearLagShape;
  readonly connected: ConnectedElement;
  /** Connection length l: along the load, first to last fastener. */
  readonly length?: number;
  /** Connection eccentricity x̄ (or ȳ for a flange-connected W, the ȳ of the half tee). */
  readonly eccentricity?: number;
  /** Fasteners per line in the direction of loading. */
  readonly fastenersPerLine?: number;
  /** Flange width, for case 7. */
  readonly bf?: number;
  /** Depth, for case 7 (for a tee, the depth the published example compares bf with; see README). */
  readonly d?: number;
  /** A U given in the file: used as is. */
  readonly given?: number;
  /**
   * Gross areas for the D3 floor of open sections (AISC 360-16/-22): U need not be less than
   * connected / member. Absent, no floor applies (AISC 360-10, plates).
   */
  readonly floor?: { readonly connectedArea: number; readonly grossArea: number };
}

/** A Table D3.1 case that applies, with its U. */
export interface ShearLagCandidate {
  readonly case: 2 | 7 | 8 | 'given' | 'D3 floor';
  readonly U: number;
  /** Why this value, in one line with the numbers. */
  readonly basis: string;
}

/** The shear lag factor and how it was chosen. */
export interface ShearLagResult {
  readonly U: number;
  readonly case: ShearLagCandidate['case'];
  /** Every case that applied; U is the largest (Table D3.1 permits the larger of case 2 and 7 or 8). */
  readonly candidates: readonly ShearLagCandidate[];
  /** The D3 floor when one was asked for (it is also among the candidates when it governs). */
  readonly floor?: ShearLagCandidate;
}
