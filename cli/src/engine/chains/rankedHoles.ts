import type { GaugeLines } from './gaugeLines.js';
import type { HoleLayout } from '../types.js';

/** A layout's holes in rank order (sorted by y), as typed arrays for the chain searches. */
export interface RankedHoles {
  /** x of the hole at each rank, times the direction sign (so the loaded side is always −x). */
  readonly X: Float64Array;
  readonly Y: Float64Array;
  /** Width deducted for the hole at each rank. */
  readonly W: Float64Array;
  /** Gauge line of the hole at each rank. */
  readonly L: Int32Array;
  /** One past the last rank of each gauge line (a line's holes occupy consecutive ranks). */
  readonly lineEnd: Int32Array;
  /** First rank of a gauge line. */
  readonly lineStart: (line: number) => number;
}

/**
 * Lays out the holes of a layout in the rank order of its gauge lines, mirrored in x by `sign`.
 * Shared by {@link leastChains} and {@link equalShareChain}, which walk the same ranks.
 *
 * @param layout - the holes
 * @param lines - the layout's gauge lines (`gaugeLines(layout)`)
 * @param sign - 1 for `-x` (or no direction), −1 for `+x`
 * @returns typed arrays indexed by rank
 * @example
 * // Two holes on one line at y = 3, one at y = 1: ranks 0 (y = 1), 1 and 2 (y = 3)
 * rankedHoles(layout, gaugeLines(layout), 1).lineStart(1) // → 1
 */
export function rankedHoles(layout: HoleLayout, lines: GaugeLines, sign: number): RankedHoles {
  const n = layout.holes.length;
  const X = new Float64Array(n);
  const Y = new Float64Array(n);
  const W = new Float64Array(n);
  const L = new Int32Array(n);
  const lineEnd = new Int32Array(lines.lines.length);
  lines.order.forEach((p, r) => {
    const h = layout.holes[p]!;
    X[r] = sign * h.x;
    Y[r] = h.y;
    W[r] = h.deducted;
    L[r] = lines.line[p]!;
    lineEnd[L[r]!] = r + 1;
  });
  const lineStart = (l: number): number => (l === 0 ? 0 : lineEnd[l - 1]!);
  return { X, Y, W, L, lineEnd, lineStart };
}
