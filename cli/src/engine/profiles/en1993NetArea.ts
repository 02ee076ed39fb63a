import { ProfileError } from './profileError.js';

/** A candidate fracture line as EN 1993-1-1 6.2.2.2 counts it. */
export interface En1993Deduction {
  /** Σ d0 of the holes on the line (n·d0 for equal holes), mm. */
  readonly holes: number;
  /** Σ s²/(4p) over the line's staggered gauge spaces, mm (0 for a straight line). */
  readonly stagger: number;
}

/**
 * Net area by EN 1993-1-1 6.2.2.2: the gross area less the LARGER of the deduction for a straight
 * fracture line, t·Σd0, and the deduction for a staggered one, t(n·d0 − Σ s²/4p), over every line
 * given. Taking the largest deduction is the same as taking the least chain (cli/docs/method.md §3).
 *
 * @param A - gross area, mm²
 * @param t - thickness, mm
 * @param lines - the straight and staggered fracture lines to compare
 * @returns Anet and the deduction that governed
 * @throws ProfileError when no line is given
 * @example
 * // SBE Part 8 WE3 (R7): L120×80×12, A = 2270, one M20 hole (d0 22) on the line
 * en1993NetArea(2270, 12, [{ holes: 22, stagger: 0 }]) // → { Anet: 2006, deduction: 264, governing: 0 }
 */
export function en1993NetArea(
  A: number,
  t: number,
  lines: readonly En1993Deduction[],
): { Anet: number; deduction: number; governing: number } {
  if (lines.length === 0) throw new ProfileError('en1993NetArea needs at least one fracture line');
  let governing = 0;
  let deduction = Number.NEGATIVE_INFINITY;
  lines.forEach((l, i) => {
    const d = t * (l.holes - l.stagger);
    if (d > deduction) {
      deduction = d;
      governing = i;
    }
  });
  deduction = Math.max(0, deduction);
  return { Anet: A - deduction, deduction, governing };
}
