import type { LoadDirection } from '../types.js';

/**
 * A load direction as written in messages, with a true minus sign.
 *
 * @param direction - the load direction
 * @returns `−x` or `+x`
 * @example
 * formatDirection('-x') // → '−x'
 */
export function formatDirection(direction: LoadDirection): string {
  return direction === '-x' ? '−x' : '+x';
}
