import { gaugeLines } from './gaugeLines.js';
import type { ChainDefect, HoleLayout } from '../types.js';

/**
 * Why a list of hole ids is not a chain (cli/docs/method.md §3: holes in strictly increasing y, at most one per
 * gauge line), or null when it is one.
 *
 * @param layout - the holes and plate
 * @param holeIds - the ids, in the order given
 * @returns the first defect found, or null
 * @example
 * // holes A1 (y 2), B1 (y 5), C1 (y 5)
 * chainDefect(layout, ['A1', 'B1'])  // → null
 * chainDefect(layout, ['B1', 'C1'])  // → { reason: 'same-gauge-line', position: 1, holeId: 'C1', … }
 * chainDefect(layout, ['B1', 'A1'])  // → { reason: 'out-of-order', position: 1, holeId: 'A1', … }
 */
export function chainDefect(layout: HoleLayout, holeIds: readonly string[]): ChainDefect | null {
  if (holeIds.length === 0)
    return { reason: 'empty', position: 0, message: 'a chain needs at least one hole' };
  const byId = new Map<string, number>();
  layout.holes.forEach((h, i) => {
    if (!byId.has(h.id)) byId.set(h.id, i);
  });
  const { line } = gaugeLines(layout);
  const seen = new Set<string>();
  let previous: { id: string; line: number } | undefined;
  for (const [position, id] of holeIds.entries()) {
    const p = byId.get(id);
    if (p === undefined) {
      return { reason: 'unknown-hole', position, holeId: id, message: `hole ${id} is not in the member` };
    }
    if (seen.has(id)) {
      return { reason: 'repeated-hole', position, holeId: id, message: `hole ${id} appears twice` };
    }
    seen.add(id);
    const l = line[p]!;
    if (previous && l === previous.line) {
      return {
        reason: 'same-gauge-line',
        position,
        holeId: id,
        message: `holes ${previous.id} and ${id} are on the same gauge line (y = ${layout.holes[p]!.y})`,
      };
    }
    if (previous && l < previous.line) {
      return {
        reason: 'out-of-order',
        position,
        holeId: id,
        message: `hole ${id} comes after ${previous.id} but lies at smaller y`,
      };
    }
    previous = { id, line: l };
  }
  return null;
}
