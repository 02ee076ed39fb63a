import type { Point } from './point.js';

function pointToSegment(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const length2 = dx * dx + dy * dy;
  const t = length2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / length2));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

function cross(o: Point, a: Point, b: Point): number {
  return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
}

/**
 * Least distance between two segments ab and cd (0 when they cross); a segment may be a point.
 * Plane geometry, used for hole outlines (a slot is a segment swept by a circle), fracture lines and
 * the drawing's label placement.
 *
 * @param a - first segment's start
 * @param b - first segment's end
 * @param c - second segment's start
 * @param d - second segment's end
 * @returns the distance
 * @example
 * segmentDistance([0, 0], [2, 0], [1, 3], [1, 1]) // → 1
 * segmentDistance([0, 0], [2, 2], [0, 2], [2, 0]) // → 0 (they cross)
 */
export function segmentDistance(a: Point, b: Point, c: Point, d: Point): number {
  const d1 = cross(a, b, c);
  const d2 = cross(a, b, d);
  const d3 = cross(c, d, a);
  const d4 = cross(c, d, b);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return 0;
  return Math.min(
    pointToSegment(a, c, d),
    pointToSegment(b, c, d),
    pointToSegment(c, a, b),
    pointToSegment(d, a, b),
  );
}
