import type { HoleLayout } from '../types.js';

/**
 * The distance below which two positions in a layout count as equal ("exactly on the fracture line",
 * "on the same gauge line"): 1e-9 of the layout's scale, so the test does not depend on units.
 *
 * @param layout - the holes and plate
 * @returns 1e-9 × max(width, |x|, |y|, 1)
 * @example
 * layoutTolerance({ width: 14, thickness: 0.5, holes: [] }) // → 1.4e-8
 */
export function layoutTolerance(layout: HoleLayout): number {
  let scale = Math.max(1, Math.abs(layout.width));
  for (const h of layout.holes) scale = Math.max(scale, Math.abs(h.x), Math.abs(h.y));
  return 1e-9 * scale;
}
