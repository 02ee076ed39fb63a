import type { Point } from '../geometry/point.js';

/** A hole's outline as a segment swept by a circle: a circle when the segment is a point. */
export interface HoleOutline {
  readonly a: Point;
  readonly b: Point;
  readonly radius: number;
}

/**
 * Outline of a round hole or slot centred at (x, y) with nominal dimensions across and along the load.
 *
 * @param x - centre along the load
 * @param y - centre across the load
 * @param across - nominal dimension across the load
 * @param along - nominal dimension along the load
 * @returns the swept segment and radius
 * @example
 * holeOutline(0, 5, 0.8125, 1.875) // → { a: [-0.53125, 5], b: [0.53125, 5], radius: 0.40625 }
 */
export function holeOutline(x: number, y: number, across: number, along: number): HoleOutline {
  const radius = Math.min(across, along) / 2;
  const halfAlong = Math.max(0, along / 2 - radius);
  const halfAcross = Math.max(0, across / 2 - radius);
  return { a: [x - halfAlong, y - halfAcross], b: [x + halfAlong, y + halfAcross], radius };
}
