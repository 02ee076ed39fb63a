/**
 * Whether two chains name the same holes in the same order (chains list their holes in y order).
 *
 * @param a - hole ids of one chain
 * @param b - hole ids of the other
 * @returns true when they are the same chain
 * @example
 * sameHoles(['A', 'B'], ['A', 'B']) // → true
 * sameHoles(['A', 'B'], ['B', 'A']) // → false
 */
export function sameHoles(a: readonly string[], b: readonly string[]): boolean {
  return a.length === b.length && a.every((id, i) => id === b[i]);
}
