import type { GaugeLines } from './gaugeLines.js';
import type { HoleLayout, LoadDirection } from '../types.js';

/** +1 for `-x`, −1 for `+x`: multiplying x by it turns every direction into `-x`. */
export function directionSign(direction: LoadDirection): 1 | -1 {
  return direction === '-x' ? 1 : -1;
}

/**
 * Signed distance along the load from a chain's fracture line to every hole, for direction `-x`
 * after x is multiplied by `sign` (cli/docs/method.md §3–4): the line runs straight across at the first hole's x
 * from y = 0, hole to hole, and straight at the last hole's x to y = width. Positive: the far side;
 * negative: the loaded side; NaN for the chain's own holes. A hole on a chain hole's gauge line is
 * judged against that hole's x; one between two chain holes against the leg joining them.
 *
 * @param layout - the holes and plate
 * @param lines - the layout's gauge lines
 * @param chain - positions in `layout.holes` of the chain's holes, in increasing y
 * @param sign - {@link directionSign} of the direction
 * @returns one residual per hole position
 * @example
 * // D.9 straight chain A–D at x = 0, direction -x: B and C at x = 2.5 lie 2.5 beyond the line
 * fractureResiduals(d9, gaugeLines(d9), [0, 3], 1) // → [NaN, 2.5, 2.5, NaN]
 */
export function fractureResiduals(
  layout: HoleLayout,
  lines: GaugeLines,
  chain: readonly number[],
  sign: 1 | -1,
): number[] {
  const holes = layout.holes;
  const residual = new Array<number>(holes.length).fill(Number.NaN);
  if (chain.length === 0) return residual;
  const inChain = new Set(chain);
  const chainLine = chain.map((p) => lines.line[p]!);
  let leg = 0;
  for (const p of lines.order) {
    if (inChain.has(p)) continue;
    const h = holes[p]!;
    const l = lines.line[p]!;
    const X = sign * h.x;
    while (leg < chain.length && chainLine[leg]! < l) leg += 1;
    // leg = index of the first chain hole whose line is ≥ l.
    let lineX: number;
    if (leg === 0) {
      lineX = sign * holes[chain[0]!]!.x;
    } else if (leg === chain.length) {
      lineX = sign * holes[chain[chain.length - 1]!]!.x;
    } else if (chainLine[leg] === l) {
      lineX = sign * holes[chain[leg]!]!.x;
    } else {
      const a = holes[chain[leg - 1]!]!;
      const b = holes[chain[leg]!]!;
      const xa = sign * a.x;
      const xb = sign * b.x;
      lineX = xa + ((xb - xa) * (h.y - a.y)) / (b.y - a.y);
    }
    residual[p] = X - lineX;
  }
  return residual;
}
