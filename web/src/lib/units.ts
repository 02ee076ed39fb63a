/** Chains as the web shows and keys them; numbers are written by the engine's formatQuantity. */

export function chainLabel(holes: readonly string[]): string {
  return holes.length === 0 ? '(straight across, no holes)' : holes.join(' – ');
}

/** Stable key for a chain within a direction, used to tie table rows to drawn fracture lines. */
export function chainKey(direction: string, holes: readonly string[]): string {
  return `${direction}:${holes.join(',')}`;
}
