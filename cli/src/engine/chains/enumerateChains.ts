import { buildChain } from './buildChain.js';
import { assertLayout } from './assertLayout.js';
import { EngineError } from '../engineError.js';
import { directionSign, fractureResiduals } from './fractureResiduals.js';
import { gaugeLines } from './gaugeLines.js';
import { layoutTolerance } from './layoutTolerance.js';
import type { Chain, HoleLayout, LoadDirection } from '../types.js';

/** Options of {@link enumerateChains}. */
export interface EnumerateOptions {
  /** Keep only chains that can form under the full load from this direction; null or absent: all. */
  readonly direction?: LoadDirection | null;
  /** Refuse layouts with more chains than this (default 2 000 000). */
  readonly limit?: number;
}

/**
 * Every chain of a layout, by brute force: for each gauge line, no hole or one of its holes
 * (cli/docs/method.md §4: Π(holes per line + 1) − 1 chains). For small patterns and for checking the fast search
 * ({@link leastChains}); it refuses layouts whose count exceeds `limit`.
 *
 * @param layout - the holes and plate
 * @param options - direction filter and size limit
 * @returns the chains, ascending by net width (ties in enumeration order)
 * @throws EngineError ('too-many-chains') when the layout has more chains than the limit
 * @example
 * // D.9 (four gauge lines of one hole each): 2⁴ − 1 = 15 chains, the least 11.54 in
 * enumerateChains(d9).length          // → 15
 * enumerateChains(d9)[0]?.netWidth    // → 11.5417
 */
export function enumerateChains(layout: HoleLayout, options: EnumerateOptions = {}): Chain[] {
  assertLayout(layout, 'enumerateChains');
  const limit = options.limit ?? 2_000_000;
  const direction = options.direction ?? null;
  const lines = gaugeLines(layout);
  let count = 1;
  for (const line of lines.lines) {
    count *= line.length + 1;
    if (count - 1 > limit) {
      throw new EngineError(
        'too-many-chains',
        `enumerateChains: the layout has more than ${limit} chains; use leastChains instead`,
      );
    }
  }
  const eps = layoutTolerance(layout);
  const sign = direction === null ? 1 : directionSign(direction);
  const found: Chain[] = [];
  const current: number[] = [];
  const visit = (l: number): void => {
    if (l === lines.lines.length) {
      if (current.length === 0) return;
      if (direction !== null) {
        const residual = fractureResiduals(layout, lines, current, sign);
        for (const r of residual) if (!Number.isNaN(r) && !(r > eps)) return;
      }
      found.push(buildChain(layout, current));
      return;
    }
    visit(l + 1);
    for (const p of lines.lines[l]!) {
      current.push(p);
      visit(l + 1);
      current.pop();
    }
  };
  visit(0);
  return found
    .map((chain, i) => ({ chain, i }))
    .sort((a, b) => a.chain.netWidth - b.chain.netWidth || a.i - b.i)
    .map((e) => e.chain);
}
