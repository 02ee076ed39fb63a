import { buildChain } from './buildChain.js';
import { assertLayout } from './assertLayout.js';
import { EngineError } from '../engineError.js';
import { directionSign } from './fractureResiduals.js';
import { gaugeLines } from './gaugeLines.js';
import { layoutTolerance } from './layoutTolerance.js';
import { rankedHoles } from './rankedHoles.js';
import type { Chain, HoleLayout, LoadDirection } from '../types.js';

/** A path from the y = 0 edge to a hole; `cost` = Σ(−deducted) + Σ s²/4g so far. */
interface PartialPath {
  readonly rank: number;
  readonly cost: number;
  readonly prev: PartialPath | null;
}

/** Inserts into a list sorted by cost, keeping at most k; equal costs keep insertion order. */
function insertBounded(list: PartialPath[], path: PartialPath, k: number): void {
  let i = list.length;
  while (i > 0 && list[i - 1]!.cost > path.cost) i -= 1;
  if (i >= k) return;
  list.splice(i, 0, path);
  if (list.length > k) list.pop();
}

/**
 * The k least chains of a layout, without listing all chains (cli/docs/method.md §4). Holes sorted by y form a
 * DAG from the y = 0 edge to the y = width edge, with an edge i → j for every pair on increasing gauge
 * lines, weighted −(deducted width of j) + s²/4g; the net width of a path is the plate width plus its
 * weight. For a load direction only admissible legs are kept: the fracture line's admissibility is
 * local to each leg (each hole not in the chain is judged against the one leg, node or end whose y
 * covers it), so for fixed i the scan over j in increasing y keeps the running least slope of the holes
 * passed. The k best partial paths are kept per hole; the search is O(n²) legs.
 *
 * @param layout - the holes and plate
 * @param direction - keep chains that can form under the full load from this direction; null: all
 * @param k - how many chains (default 10)
 * @returns up to k chains, ascending by net width, distinct; empty when the layout has no holes
 * @throws EngineError when k is not a positive integer or the layout has a bad value
 * @example
 * // AISC Design Examples v13.0 D.9, loaded from -x: the zigzag A–B–C–D governs
 * leastChains(d9, '-x', 2).map((c) => c.netWidth) // → [11.5417, 12.1190] (published 11.5, 12.1 in)
 */
export function leastChains(layout: HoleLayout, direction: LoadDirection | null, k = 10): Chain[] {
  if (!Number.isInteger(k) || k < 1) {
    throw new EngineError('invalid-argument', `leastChains: k must be a positive integer, got ${k}`);
  }
  assertLayout(layout, 'leastChains');
  const n = layout.holes.length;
  if (n === 0) return [];
  const lines = gaugeLines(layout);
  const eps = layoutTolerance(layout);
  const sign = direction === null ? 1 : directionSign(direction);
  const filter = direction !== null;

  // Work in rank order (sorted by y); the holes of a line occupy consecutive ranks.
  const { X, Y, W, L, lineEnd, lineStart } = rankedHoles(layout, lines, sign);

  // Node, first-leg and last-leg admissibility (all true without a direction).
  const nodeOk = new Uint8Array(n).fill(1);
  const firstOk = new Uint8Array(n).fill(1);
  const lastOk = new Uint8Array(n).fill(1);
  if (filter) {
    const lineMin = Array.from(lines.lines, (_, l) => {
      let m = Number.POSITIVE_INFINITY;
      for (let r = lineStart(l); r < lineEnd[l]!; r += 1) m = Math.min(m, X[r]!);
      return m;
    });
    const before = new Float64Array(lineMin.length + 1).fill(Number.POSITIVE_INFINITY);
    const after = new Float64Array(lineMin.length + 1).fill(Number.POSITIVE_INFINITY);
    for (let l = 0; l < lineMin.length; l += 1) before[l + 1] = Math.min(before[l]!, lineMin[l]!);
    for (let l = lineMin.length - 1; l >= 0; l -= 1) after[l] = Math.min(after[l + 1]!, lineMin[l]!);
    for (let r = 0; r < n; r += 1) {
      const l = L[r]!;
      for (let q = lineStart(l); q < lineEnd[l]!; q += 1) {
        if (q !== r && !(X[q]! - X[r]! > eps)) nodeOk[r] = 0;
      }
      firstOk[r] = before[l]! - X[r]! > eps ? 1 : 0;
      lastOk[r] = after[l + 1]! - X[r]! > eps ? 1 : 0;
    }
  }

  const best: PartialPath[][] = Array.from({ length: n }, () => []);
  for (let r = 0; r < n; r += 1) {
    if (nodeOk[r] && firstOk[r]) best[r]!.push({ rank: r, cost: -W[r]!, prev: null });
  }
  for (let r = 0; r < n; r += 1) {
    const from = best[r]!;
    if (from.length === 0) continue;
    const xr = X[r]!;
    const yr = Y[r]!;
    let leastSlope = Number.POSITIVE_INFINITY;
    for (let l = L[r]! + 1; l < lineEnd.length; l += 1) {
      const start = lineStart(l);
      const end = lineEnd[l]!;
      for (let q = start; q < end; q += 1) {
        if (!nodeOk[q]) continue;
        const dx = X[q]! - xr;
        const dy = Y[q]! - yr;
        // Leg r → q is admissible when every hole passed lies strictly beyond it.
        if (filter && !(dx / dy < leastSlope)) continue;
        const add = (dx * dx) / (4 * dy) - W[q]!;
        const to = best[q]!;
        for (const path of from) {
          const cost = path.cost + add;
          if (to.length >= k && cost >= to[k - 1]!.cost) break;
          insertBounded(to, { rank: q, cost, prev: path }, k);
        }
      }
      if (filter) {
        for (let q = start; q < end; q += 1) {
          const m = (X[q]! - xr - eps) / (Y[q]! - yr);
          if (m < leastSlope) leastSlope = m;
        }
      }
    }
  }
  const ends: PartialPath[] = [];
  for (let r = 0; r < n; r += 1) {
    if (!lastOk[r]) continue;
    for (const path of best[r]!) {
      if (ends.length >= k && path.cost >= ends[k - 1]!.cost) break;
      insertBounded(ends, path, k);
    }
  }
  return ends
    .map((path, i) => {
      const positions: number[] = [];
      for (let p: PartialPath | null = path; p; p = p.prev) positions.push(lines.order[p.rank]!);
      positions.reverse();
      return { chain: buildChain(layout, positions), i };
    })
    .sort((a, b) => a.chain.netWidth - b.chain.netWidth || a.i - b.i)
    .map((e) => e.chain);
}
