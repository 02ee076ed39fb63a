/** A hole as the spacing rules see it. */
export interface SpacingHole {
  readonly x: number;
  readonly y: number;
}

/** Least and greatest spacings of a hole pattern in a plate or leg. */
export interface HoleSpacings {
  /** Least end distance along the load (needs the ends). */
  readonly e1?: number;
  /** Least edge distance across the load. */
  readonly e2?: number;
  /** Least spacing along the load between holes on one gauge line. */
  readonly p1?: number;
  /** Least spacing across the load between adjacent gauge lines whose holes are in line (share an x). */
  readonly p2?: number;
  /**
   * Least spacing across the load between adjacent gauge lines that are staggered (no hole of one
   * line at the x of a hole of the other): EN 1993-1-8 Table 3.3 note 5 relaxes p2 for these.
   */
  readonly p2Staggered?: number;
  /** Least centre-to-centre distance between any two holes. */
  readonly L?: number;
  /** Greatest end or edge distance. */
  readonly eMax?: number;
  /** Greatest spacing between neighbouring holes along a line or across adjacent lines. */
  readonly pMax?: number;
}

/**
 * The spacings detailing rules read, measured from a hole pattern: e2 to the longitudinal edges y = 0
 * and y = width, e1 to the ends x = ends[0] and x = ends[1] when given, p1 along each gauge line, p2
 * between adjacent gauge lines (common practice reading of EN 1993-1-8 Fig. 3.1 for regular patterns),
 * kept apart as p2Staggered when the two lines are staggered, and L the least centre-to-centre distance.
 *
 * @param holes - hole centres
 * @param width - width across the load
 * @param ends - x of the two ends, if the member ends are in the layout
 * @returns the spacings found (absent where the pattern has none)
 * @example
 * holeSpacings([{ x: 40, y: 30 }, { x: 110, y: 30 }, { x: 40, y: 90 }], 120, [0, 300])
 * // → { e1: 40, e2: 30, p1: 70, p2: 60, L: 60, eMax: 40, pMax: 70 }
 */
export function holeSpacings(
  holes: readonly SpacingHole[],
  width: number,
  ends?: readonly [number, number],
): HoleSpacings {
  if (holes.length === 0) return {};
  const eps = 1e-9 * Math.max(1, width);
  const ys = [...new Set(holes.map((h) => h.y))].sort((a, b) => a - b);
  const lines = ys.map((y) =>
    holes
      .filter((h) => Math.abs(h.y - y) <= eps)
      .map((h) => h.x)
      .sort((a, b) => a - b),
  );
  let e2 = Number.POSITIVE_INFINITY;
  for (const h of holes) e2 = Math.min(e2, h.y, width - h.y);
  let eMax = Math.max(ys[0]!, width - ys[ys.length - 1]!);
  let e1: number | undefined;
  if (ends) {
    const lo = Math.min(...ends);
    const hi = Math.max(...ends);
    const xs = holes.map((h) => h.x);
    e1 = Math.min(Math.min(...xs) - lo, hi - Math.max(...xs));
    // Each line's end distance at the nearer end (the connection end of a bolted member).
    for (const l of lines) eMax = Math.max(eMax, Math.min(l[0]! - lo, hi - l[l.length - 1]!));
  }
  let p1 = Number.POSITIVE_INFINITY;
  let pMax = 0;
  for (const l of lines) {
    for (let i = 1; i < l.length; i++) {
      p1 = Math.min(p1, l[i]! - l[i - 1]!);
      pMax = Math.max(pMax, l[i]! - l[i - 1]!);
    }
  }
  let p2 = Number.POSITIVE_INFINITY;
  let p2Staggered = Number.POSITIVE_INFINITY;
  for (let i = 1; i < ys.length; i++) {
    const gap = ys[i]! - ys[i - 1]!;
    const inLine = lines[i]!.some((x) => lines[i - 1]!.some((x0) => Math.abs(x - x0) <= eps));
    if (inLine) p2 = Math.min(p2, gap);
    else p2Staggered = Math.min(p2Staggered, gap);
    pMax = Math.max(pMax, gap);
  }
  let L = Number.POSITIVE_INFINITY;
  for (let i = 0; i < holes.length; i++) {
    for (let j = i + 1; j < holes.length; j++) {
      L = Math.min(L, Math.hypot(holes[j]!.x - holes[i]!.x, holes[j]!.y - holes[i]!.y));
    }
  }
  return {
    ...(e1 === undefined ? {} : { e1 }),
    e2,
    ...(Number.isFinite(p1) ? { p1 } : {}),
    ...(Number.isFinite(p2) ? { p2 } : {}),
    ...(Number.isFinite(p2Staggered) ? { p2Staggered } : {}),
    ...(Number.isFinite(L) ? { L } : {}),
    eMax,
    ...(pMax > 0 ? { pMax } : {}),
  };
}
