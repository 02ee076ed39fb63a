/**
 * The drawing model: plain data a renderer turns into marks. Coordinates are in paper millimetres
 * with the origin at the sheet's top-left corner and y pointing down (as in SVG and the DOM); the
 * member itself is drawn to a stated scale (1:n), with its x axis to the right and y up the sheet.
 *
 * Shapes come in drawing order (back to front). Each names a {@link StrokeName}; {@link STROKES}
 * says how each looks, so the SVG serialiser and the web's React renderer draw the same sketch.
 */
import type { CodeProfile, LoadDirection, UnitSystem } from '../engine/types.js';

// Points on the sheet (paper mm) are the package's one point type.
export type { Point } from '../engine/geometry/point.js';
import type { Point } from '../engine/geometry/point.js';

export interface Segment {
  readonly from: Point;
  readonly to: Point;
}

/** Line styles of the sketch. */
export type StrokeName =
  | 'frame'
  | 'outline'
  | 'hole'
  | 'centre'
  | 'extension'
  | 'dimension'
  | 'tick'
  | 'load'
  | 'fracture-minus'
  | 'fracture-plus'
  | 'claimed'
  | 'leader';

export interface StrokeStyle {
  /** Line width, paper mm. */
  readonly width: number;
  readonly colour: string;
  /** Dash pattern in paper mm, none for continuous. */
  readonly dash?: readonly number[];
}

/** How each stroke looks: heavy outline, thin dimensions, dash-dot centre lines, dashed fracture lines. */
export const STROKES: Readonly<Record<StrokeName, StrokeStyle>> = {
  frame: { width: 0.35, colour: '#222222' },
  outline: { width: 0.6, colour: '#1a1a1a' },
  hole: { width: 0.45, colour: '#1a1a1a' },
  centre: { width: 0.18, colour: '#555555', dash: [4, 1, 0.6, 1] },
  extension: { width: 0.18, colour: '#444444' },
  dimension: { width: 0.18, colour: '#444444' },
  tick: { width: 0.35, colour: '#222222' },
  load: { width: 0.45, colour: '#1a1a1a' },
  'fracture-minus': { width: 0.5, colour: '#c0392b', dash: [2.4, 1.2] },
  'fracture-plus': { width: 0.5, colour: '#1f5aa6', dash: [0.9, 1.1] },
  // Solid, thinner than the dashed governing lines, with a diamond at each claimed hole.
  claimed: { width: 0.4, colour: '#6a3d9a' },
  leader: { width: 0.18, colour: '#444444' },
};

/** Text roles, for renderers that style them (size and weight are given on each text). */
export type TextRole =
  'hole-id' | 'dimension' | 'load' | 'fracture' | 'claimed' | 'label' | 'title' | 'title-detail' | 'caution';

export interface TextShape {
  readonly kind: 'text';
  readonly at: Point;
  readonly text: string;
  /** Cap height-ish font size, paper mm. */
  readonly size: number;
  readonly anchor: 'start' | 'middle' | 'end';
  /** Rotation in degrees about `at`, counter-clockwise positive on the sheet (−90 reads bottom to top). */
  readonly rotate?: number;
  readonly weight?: 'normal' | 'bold';
  readonly italic?: boolean;
  readonly colour?: string;
  readonly role: TextRole;
}

export interface LineShape {
  readonly kind: 'line';
  readonly from: Point;
  readonly to: Point;
  readonly stroke: StrokeName;
}

export interface PolylineShape {
  readonly kind: 'polyline';
  readonly points: readonly Point[];
  readonly closed: boolean;
  readonly stroke: StrokeName;
}

/** A round hole, drawn at its nominal diameter. */
export interface CircleShape {
  readonly kind: 'circle';
  readonly holeId: string;
  readonly centre: Point;
  readonly radius: number;
  readonly stroke: StrokeName;
}

/** A slotted hole: a stadium `along` long in sheet x and `across` tall in sheet y. */
export interface SlotShape {
  readonly kind: 'slot';
  readonly holeId: string;
  readonly centre: Point;
  readonly along: number;
  readonly across: number;
  readonly stroke: StrokeName;
}

/** A dimension: extension lines, the dimension line, oblique ticks at its ends and its value. */
export interface DimensionShape {
  readonly kind: 'dimension';
  /** gauge (across the load), pitch (along it) or overall width. */
  readonly measure: 'gauge' | 'pitch' | 'width';
  /** The real distance, in the member's units. */
  readonly value: number;
  /**
   * Extension lines drawn for this dimension. Where a hole's centre line runs out to the dimension
   * line it is the extension line (drawn once, as a centre line), so this list can be empty.
   */
  readonly extensions: readonly Segment[];
  readonly line: Segment;
  readonly ticks: readonly Segment[];
  readonly label: TextShape;
}

/** A load arrow: shaft from tail to head, a filled head at `head`. */
export interface ArrowShape {
  readonly kind: 'arrow';
  /** A load at a loaded end, or one of the small x/y axes beside the plate. */
  readonly purpose: 'load' | 'axis-x' | 'axis-y';
  /** For load arrows, the load direction they show. */
  readonly direction?: LoadDirection;
  readonly tail: Point;
  readonly head: Point;
  readonly headLength: number;
  readonly headWidth: number;
  readonly stroke: StrokeName;
}

/** The governing fracture line of a direction: edge → hole centres → far edge. */
export interface FractureShape {
  readonly kind: 'fracture';
  readonly directions: readonly LoadDirection[];
  readonly holes: readonly string[];
  /** Net width of the chain, member units. */
  readonly netWidth: number;
  readonly points: readonly Point[];
  readonly stroke: StrokeName;
  readonly label: TextShape;
  /** From the line's end at the edge to the label. */
  readonly leader: Segment;
}

/**
 * The chain the calc file claims controls, drawn beside the governing fracture lines: edge → hole
 * centres → far edge as a solid line, a diamond around each of its holes, and a label below the plate.
 */
export interface ClaimedChainShape {
  readonly kind: 'claimed-chain';
  /** The claimed hole ids, as the file gives them. */
  readonly holes: readonly string[];
  readonly direction?: LoadDirection;
  /** The claimed net width, member units, when the file claims one. */
  readonly netWidth?: number;
  /** Through the centres of the claimed holes found on the plate; empty when none is. */
  readonly points: readonly Point[];
  /** One closed diamond around each claimed hole found on the plate. */
  readonly markers: readonly (readonly Point[])[];
  readonly stroke: StrokeName;
  readonly label: TextShape;
  /** From the line's end at the plate edge to the label. */
  readonly leader?: Segment;
}

/** A plain rectangle (frame, title block cells), paper mm. */
export interface RectShape {
  readonly kind: 'rect';
  readonly at: Point;
  readonly width: number;
  readonly height: number;
  readonly stroke: StrokeName;
}

export type Shape =
  | TextShape
  | LineShape
  | PolylineShape
  | CircleShape
  | SlotShape
  | DimensionShape
  | ArrowShape
  | FractureShape
  | ClaimedChainShape
  | RectShape;

export interface Drawing {
  /** Sheet size, paper mm. */
  readonly width: number;
  readonly height: number;
  /** The member is drawn at 1:`scale` (paper mm per real mm is 1/scale). */
  readonly scale: number;
  /** Paper mm per member unit (in or mm). */
  readonly paperPerUnit: number;
  readonly units: UnitSystem;
  readonly memberId: string;
  /** One-line description for accessibility (SVG <title>, aria-label). */
  readonly title: string;
  readonly shapes: readonly Shape[];
}

/** Options of buildDrawing: the units, and what the title block and the foot of the sheet say. */
export interface DrawOptions {
  readonly units: UnitSystem;
  readonly profile?: CodeProfile;
  readonly project?: string;
  /** Line printed along the foot of the sheet. */
  readonly caution?: string;
}
