import type { MemberInput, MemberResult, UnitSystem } from '../engine/types.js';
import { MM_PER, TITLE, type SheetFrame } from './sheet.js';

/** Standard drawing scales tried in order: the first that fits the plate on the sheet wins. */
const SCALES = [1, 2, 2.5, 5, 10, 20, 25, 50, 100, 200];
/** The largest plate image, paper mm. */
const MAX_PLATE = { along: 210, across: 120 };
const MARGIN = { left: 34, right: 52, top: 26, bottom: 22 };

/**
 * Where a member is drawn and at what scale. The plate's length is not part of a calc file, so the
 * outline runs past the outermost holes by the larger of 2 hole sizes and a fifth of the width (so it
 * reads as a plate and not a strip); the first standard scale that fits that on the sheet is used, and
 * the sheet is sized around it with room for the dimension strings and the title block.
 *
 * @param member - the member
 * @param result - its analysis (hole sizes)
 * @param units - the member's units
 * @returns the frame: scale, paper mm per unit, sheet size, outline and the member → paper transforms
 * @example
 * // AISC Design Examples v13.0 D.9: a 14 in plate with holes over 2.5 in fits at 1:5
 * sheetFrame(d9, result, 'in').scale // → 5
 */
export function sheetFrame(member: MemberInput, result: MemberResult, units: UnitSystem): SheetFrame {
  const W = member.width;
  const holes = member.holes;
  const eps = 1e-6 * Math.max(1, W);
  const largest = Math.max(0, ...result.holeWidths.map((h) => Math.max(h.nominalAlong, h.nominalAcross)));
  const endDistance = Math.max(2 * largest, 0.2 * W);
  const xs = holes.map((h) => h.x);
  const x0 = (xs.length > 0 ? Math.min(...xs) : 0) - endDistance;
  const x1 = (xs.length > 0 ? Math.max(...xs) : W) + endDistance;
  const lengthReal = x1 - x0;

  const mm = MM_PER[units];
  const scale =
    SCALES.find((n) => (lengthReal * mm) / n <= MAX_PLATE.along && (W * mm) / n <= MAX_PLATE.across) ?? 500;
  const k = mm / scale;
  const plateW = lengthReal * k;
  const plateH = W * k;

  const sheetW = Math.max(MARGIN.left + plateW + MARGIN.right, TITLE.width + 28);
  const left = MARGIN.left + Math.max(0, (sheetW - MARGIN.left - MARGIN.right - plateW) / 2);
  const top = MARGIN.top;
  const sheetH = top + plateH + MARGIN.bottom + TITLE.height + 18;
  return {
    units,
    scale,
    k,
    sheetW,
    sheetH,
    left,
    top,
    right: left + plateW,
    bottom: top + plateH,
    W,
    eps,
    X: (x: number): number => left + (x - x0) * k,
    Y: (y: number): number => top + (W - y) * k,
  };
}
