/**
 * Types of members made of connected flat elements (angles, tees, W-shapes, channels). Lengths, areas
 * and forces follow the unit system of the calc file (see ../types.ts).
 *
 * Geometry model (see README.md in this folder): every element is a flat strip with a centreline.
 * A position in an element is `u`, the distance along its centreline from the element's start
 * (`u = 0`) to its end (`u = span`). Elements meet at junctions: the point where their centrelines
 * cross. Gauges between holes are distances along the centrelines, so a gauge that crosses an
 * angle's heel is the sum of the gauges from the heel less the thickness (AISC 360 B4.3b).
 */

import type { LoadDirection } from '../types.js';

/** What an element is in its section; only used in names, messages and drawings. */
export type ElementRole = 'leg' | 'flange' | 'web' | 'stem' | 'plate';

/** One flat element of a section. */
export interface SectionElement {
  readonly id: string;
  readonly role: ElementRole;
  /** Thickness of the element. */
  readonly thickness: number;
  /**
   * Width of material that belongs to this element alone, used for the gross area (overlaps with
   * other elements are given to one element only): e.g. an angle's second leg is `b − t` wide.
   */
  readonly areaWidth: number;
  /** Length of the element's centreline from its start to its end (`u` runs over `[0, span]`). */
  readonly span: number;
  /**
   * How a detailer's gauge for a hole in this element becomes `u`: `u = datum + gauge`. For an angle
   * leg gauged from the heel, `datum = −t/2`; for a flange gauged from the web centreline (a signed
   * gauge, negative toward `u = 0`), `datum = span/2`.
   */
  readonly datum: number;
  /** Words naming where the gauge is measured from, e.g. `heel (back of the other leg)`. */
  readonly gaugeFrom: string;
  /**
   * Placement of the element in the unfolded (flattened) drawing: `y = unfoldOffset + unfoldSense·u`.
   * For sections joined end to end (angles, channels, plates) differences of unfolded y are gauges.
   */
  readonly unfoldOffset: number;
  readonly unfoldSense: 1 | -1;
}

/** One element's part in a junction: which element, and where along its centreline. */
export interface JunctionAttachment {
  readonly element: string;
  readonly u: number;
}

/** A line along the member where two or more elements meet (an angle's heel, a web-to-flange junction). */
export interface SectionJunction {
  readonly id: string;
  readonly attachments: readonly JunctionAttachment[];
}

export type SectionShape = 'plate' | 'angle' | 'tee' | 'w-shape' | 'channel';

/** A member's cross-section as connected flat elements. */
export interface Section {
  readonly shape: SectionShape;
  /** Human-readable designation of the builder's dimensions, e.g. `L6x6x5/8 (6 × 6 × 0.625)`. */
  readonly designation: string;
  readonly elements: readonly SectionElement[];
  readonly junctions: readonly SectionJunction[];
  /**
   * Identical pieces acting together with identical holes (2 for a double angle back to back):
   * every area is multiplied by it.
   */
  readonly pieces: number;
}

/** A hole in a section, as a detailer gives it. */
export interface SectionHoleInput {
  readonly id: string;
  /** Id of the element the hole lies in. */
  readonly element: string;
  /** Position along the member (the load axis). */
  readonly x: number;
  /** Gauge as the element's `gaugeFrom` says (signed for gauges from a centreline). */
  readonly gauge: number;
  /** Width the hole deducts in net area (nominal across the load plus any damage allowance). */
  readonly deducted: number;
}

/** A hole placed in the unfolded layout. */
export interface UnfoldedHole {
  readonly id: string;
  /** Index in the input array. */
  readonly index: number;
  readonly element: string;
  readonly x: number;
  /** Position along the element's centreline. */
  readonly u: number;
  /** Position in the unfolded drawing. */
  readonly y: number;
  /** Thickness of the element the hole lies in. */
  readonly thickness: number;
  readonly deducted: number;
}

/** A section with its holes unfolded: the input of every section chain search. */
export interface SectionLayout {
  readonly section: Section;
  readonly holes: readonly UnfoldedHole[];
  /** Centreline distance between every pair of holes (`gauges[i][j]`, symmetric, 0 on the diagonal). */
  readonly gauges: readonly (readonly number[])[];
  /**
   * Thickness a leg between two holes takes its s²/4g term at: the element's own thickness inside one
   * element, the least thickness of the elements it passes through across junctions.
   */
  readonly legThickness: readonly (readonly number[])[];
  /** Ids of the junctions the centreline path between two holes crosses. */
  readonly legJunctions: readonly (readonly (readonly string[])[])[];
  /** Gross area used (tabulated when given, else from the elements), all pieces. */
  readonly Ag: number;
  /** Lengths below this count as equal. */
  readonly tolerance: number;
}

/** One gauge space of a section chain. */
export interface SectionLeg {
  readonly from: string;
  readonly to: string;
  /** Stagger along the load, ≥ 0. */
  readonly s: number;
  /** Gauge along the centrelines, > 0. */
  readonly g: number;
  /** s²/(4g). */
  readonly term: number;
  /** Thickness the term is taken at: the leg's element, or the thinnest element it crosses. */
  readonly thickness: number;
  /** term · thickness · pieces. */
  readonly area: number;
  /** Ids of the junctions the leg crosses (empty inside one element). */
  readonly junctions: readonly string[];
}

/** A chain of holes across a section, with its net area. */
export interface SectionChain {
  /** Hole ids in unfolded-y order. */
  readonly holes: readonly string[];
  readonly legs: readonly SectionLeg[];
  /** Σ deducted width × element thickness × pieces. */
  readonly deductedArea: number;
  /** Σ leg areas. */
  readonly staggerArea: number;
  /** Ag − deductedArea + staggerArea. */
  readonly netArea: number;
}

/** Why a section chain cannot fracture under the full load from a direction (cli/docs/method.md §4). */
export interface SectionChainRejection {
  readonly direction: LoadDirection;
  readonly blockingHole: string;
  readonly reason: 'loaded-side' | 'on-line';
}

/** Gross area of a section, from its elements and as tabulated. */
export interface SectionGrossArea {
  /** Σ areaWidth × thickness × pieces. */
  readonly fromElements: number;
  /** Tabulated value given in the input, if any. */
  readonly tabulated?: number;
  /** The value used: the tabulated one when given. */
  readonly used: number;
  /** tabulated − fromElements, when a tabulated value is given (fillets make it positive for rolled shapes). */
  readonly difference?: number;
}

/** Net section of a section for one load direction. */
export interface SectionDirectionResult {
  readonly direction: LoadDirection;
  readonly governing: SectionChain | null;
  readonly leastChains: readonly SectionChain[];
  /** min(governing net area, Ag). */
  readonly An: number;
}

/** Net section of a section for the directions asked for. */
export interface SectionResult {
  readonly grossArea: SectionGrossArea;
  readonly layout: SectionLayout;
  readonly directions: readonly SectionDirectionResult[];
  readonly An: number;
  readonly governingDirection: LoadDirection;
}
