/**
 * The distinct values of a list, ascending; values closer than `eps` to the previous kept one are the
 * same (a gauge line or a row of holes).
 *
 * @param values - the values
 * @param eps - the least difference between two distinct values
 * @returns the distinct values, ascending
 * @example
 * distinctSorted([5, 2, 5.0000001, 9], 1e-6) // → [2, 5, 9]
 */
export function distinctSorted(values: readonly number[], eps: number): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  const out: number[] = [];
  for (const v of sorted) if (out.length === 0 || v - out[out.length - 1]! > eps) out.push(v);
  return out;
}
