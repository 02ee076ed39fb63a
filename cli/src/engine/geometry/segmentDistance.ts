/** A point in the plate's plane. */
export interface Point {
  readonly x: number;
  readonly y: number;
}

function pointToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const length2 = dx * dx + dy * dy;
  const t = length2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / length2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

function cross(o: Point, a: Point, b: Point): number {
  return (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
}

/**
 * Least distance between two segments ab and cd (0 when they cross); a segment may be a point.
 * Plane geometry, used for hole outlines (a slot is a segment swept by a circle) and fracture lines.
 *
 * @param a - first segment's start
 * @param b - first segment's end
 * @param c - second segment's start
 * @param d - second segment's end
 * @returns the distance
 * @example
 * segmentDistance({ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 1, y: 3 }, { x: 1, y: 1 }) // → 1
 * segmentDistance({ x: 0, y: 0 }, { x: 2, y: 2 }, { x: 0, y: 2 }, { x: 2, y: 0 }) // → 0 (they cross)
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
