import { buildChain } from './buildChain.js';
import { assertLayout } from './assertLayout.js';
import { directionSign, fractureResiduals } from './fractureResiduals.js';
import { gaugeLines } from './gaugeLines.js';
import { layoutTolerance } from './layoutTolerance.js';
import { leastChains } from './leastChains.js';
import { rankedHoles } from './rankedHoles.js';
import type { HoleLayout, LoadDirection, EqualShareChain } from '../types.js';

/** A path from the y = 0 edge to a hole: `loaded` fasteners passed on the loaded side so far. */
interface ShareState {
  readonly rank: number;
  readonly loaded: number;
  readonly cost: number;
  readonly prev: ShareState | null;
}

/**
 * Adds a state to a Pareto front kept ascending by `loaded` with strictly falling cost: a state is
 * useless when another has no more loaded fasteners and no more cost.
 */
function insertPareto(front: ShareState[], state: ShareState): void {
  let lo = 0;
  let hi = front.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (front[mid]!.loaded <= state.loaded) lo = mid + 1;
    else hi = mid;
  }
  // front[lo - 1] is the last state with loaded ≤ state.loaded: the least cost among them.
  if (lo > 0 && front[lo - 1]!.cost <= state.cost) return;
  let drop = lo;
  while (drop < front.length && front[drop]!.cost >= state.cost) drop += 1;
  front.splice(lo, drop - lo, state);
}

function lowerBound(sorted: Float64Array, value: number, length: number): number {
  let lo = 0;
  let hi = length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Equal-share rule (cli/docs/method.md §4): with every fastener taking an equal share of the load, a chain
 * carries the share of the fasteners in it or on its far side (holes exactly on the fracture line
 * count as carried), and the chain with the least netArea / share over ALL chains is the one to
 * compare with the full-load net area. The number of fasteners left on the loaded side is a sum over
 * the chain's legs, so the search is the DAG of {@link leastChains} with states (hole, fasteners on the
 * loaded side so far), keeping per hole only the Pareto-useful (count, width) states; a Fenwick tree
 * over slopes counts the loaded-side holes of each leg in O(log n). States that cannot beat the best
 * chain found so far (starting from the least full-load chain) are dropped, bounding what remains by
 * the least width still to come from each hole. Assumes positive net widths.
 *
 * @param layout - the holes and plate
 * @param direction - the load direction
 * @returns the least netArea / share chain, or null when the layout has no holes
 * @throws EngineError when the layout has a bad value (see assertLayout)
 * @example
 * // Plate 10 × 1, holes 1.0 wide: A (0, 3) and B (0, 7) side by side, C (3, 5) further along.
 * // From -x the straight A–B (wn 8) carries all three shares: 8 / 1 = 8.
 * // From +x A–B leaves C on the loaded side: 8 / (2/3) = 12, so C alone (wn 9, all shares) is least.
 * equalShareChain(layout, '-x')?.equivalentArea // → 8   (chain A-B)
 * equalShareChain(layout, '+x')?.equivalentArea // → 9   (chain C)
 */
export function equalShareChain(layout: HoleLayout, direction: LoadDirection): EqualShareChain | null {
  assertLayout(layout, 'equalShareChain');
  const n = layout.holes.length;
  if (n === 0) return null;
  const lines = gaugeLines(layout);
  const eps = layoutTolerance(layout);
  const sign = directionSign(direction);
  const { X, Y, W, L, lineEnd, lineStart } = rankedHoles(layout, lines, sign);

  // Loaded-side fasteners at each hole's own line, before its line (first leg) and after it (last leg).
  const nodeCount = new Int32Array(n);
  const firstCount = new Int32Array(n);
  const lastCount = new Int32Array(n);
  for (let r = 0; r < n; r += 1) {
    for (let q = 0; q < n; q += 1) {
      if (q === r || !(X[q]! - X[r]! < -eps)) continue;
      if (L[q]! < L[r]!) firstCount[r]! += 1;
      else if (L[q]! > L[r]!) lastCount[r]! += 1;
      else nodeCount[r]! += 1;
    }
  }

  // Least width still to come from each hole to the far edge (all chains): a bound for pruning.
  const rest = new Float64Array(n);
  for (let r = n - 1; r >= 0; r -= 1) {
    let least = 0;
    for (let q = lineEnd[L[r]!]!; q < n; q += 1) {
      const dx = X[q]! - X[r]!;
      const dy = Y[q]! - Y[r]!;
      const v = (dx * dx) / (4 * dy) - W[q]! + rest[q]!;
      if (v < least) least = v;
    }
    rest[r] = least;
  }
  const t = layout.thickness;
  const width = layout.width;
  // The least full-load chain leaves no fastener on the loaded side: its net area is a first bound.
  const start = leastChains(layout, direction, 1)[0] ?? null;
  let bestValue = start ? start.netArea : Number.POSITIVE_INFINITY;
  let bestState: ShareState | null = null;
  const slack = (v: number): number => v + 1e-9 * Math.abs(v);
  const bound = (cost: number, loaded: number): number => ((width + cost) * t * n) / (n - loaded);

  const fronts: ShareState[][] = Array.from({ length: n }, () => []);
  const offer = (state: ShareState): void => {
    if (bound(state.cost + rest[state.rank]!, state.loaded) > slack(bestValue)) return;
    const done = state.loaded + lastCount[state.rank]!;
    const value = bound(state.cost, done);
    if (value < bestValue) {
      bestValue = value;
      bestState = state;
    }
    insertPareto(fronts[state.rank]!, state);
  };
  for (let r = 0; r < n; r += 1) {
    offer({ rank: r, loaded: firstCount[r]! + nodeCount[r]!, cost: -W[r]!, prev: null });
  }
  const slopes = new Float64Array(n);
  const fenwick = new Int32Array(n + 1);
  for (let r = 0; r < n; r += 1) {
    const from = fronts[r]!.filter((st) => bound(st.cost + rest[r]!, st.loaded) <= slack(bestValue));
    if (from.length === 0) continue;
    const xr = X[r]!;
    const yr = Y[r]!;
    const beyond = lineEnd[L[r]!]!;
    const m = n - beyond;
    if (m === 0) continue;
    // A hole h passed by leg r → q lies on the loaded side when slope(r→q) > (X_h − X_r + eps)/(Y_h − Y_r).
    // The slopes are sorted only once a leg from r survives the bound.
    let sorted: Float64Array | null = null;
    let inserted = beyond;
    const insertUpTo = (limit: number): void => {
      for (; inserted < limit; inserted += 1) {
        for (let i = lowerBound(sorted!, slopes[inserted - beyond]!, m) + 1; i <= m; i += i & -i)
          fenwick[i]! += 1;
      }
    };
    const least = from[from.length - 1]!;
    const fewest = from[0]!.loaded;
    for (let l = L[r]! + 1; l < lineEnd.length; l += 1) {
      const first = lineStart(l);
      const end = lineEnd[l]!;
      for (let q = first; q < end; q += 1) {
        const dx = X[q]! - xr;
        const dy = Y[q]! - yr;
        const add = (dx * dx) / (4 * dy) - W[q]!;
        // States are ascending in loaded count and descending in cost: the last has the least cost.
        if (bound(least.cost + add + rest[q]!, fewest) > slack(bestValue)) continue;
        if (!sorted) {
          for (let h = beyond; h < n; h += 1) slopes[h - beyond] = (X[h]! - xr + eps) / (Y[h]! - yr);
          sorted = slopes.slice(0, m).sort();
          fenwick.fill(0, 0, m + 1);
        }
        insertUpTo(first);
        let i = lowerBound(sorted, dx / dy, m);
        let passed = 0;
        for (; i > 0; i -= i & -i) passed += fenwick[i]!;
        const addLoaded = passed + nodeCount[q]!;
        for (const state of from) {
          offer({ rank: q, loaded: state.loaded + addLoaded, cost: state.cost + add, prev: state });
        }
      }
    }
  }

  const found = bestState as ShareState | null;
  if (!found && start) {
    // No chain beats the least full-load chain.
    return {
      direction,
      chain: start,
      fastenersCarried: n,
      fastenersTotal: n,
      share: 1,
      equivalentArea: start.netArea,
    };
  }
  const positions: number[] = [];
  for (let s: ShareState | null = found; s; s = s.prev) positions.push(lines.order[s.rank]!);
  positions.reverse();
  const chain = buildChain(layout, positions);
  // Recount from the fracture line itself, so the figures reported do not depend on the search.
  const residual = fractureResiduals(layout, lines, positions, sign);
  const loadedSide = residual.filter((r) => r < -eps).length;
  const carried = n - loadedSide;
  const share = carried / n;
  return {
    direction,
    chain,
    fastenersCarried: carried,
    fastenersTotal: n,
    share,
    equivalentArea: chain.netArea / share,
  };
}
