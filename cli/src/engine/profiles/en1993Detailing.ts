import type { DetailingInput, DetailingIssue } from './types.js';

const fmt = (v: number): string => String(Math.round(v * 10) / 10);

/**
 * EN 1993-1-8 Table 3.3 spacing and edge checks (published limits): e1, e2 ≥ 1.2 d0; p1 ≥ 2.2 d0;
 * p2 ≥ 2.4 d0; end and edge distances ≤ 4t + 40 mm; spacings ≤ min(14t, 200 mm) (t the thinner outer
 * connected part). Where the table says they apply (from memory of its notes):
 * - note 5: for staggered rows p2 may be as small as 1.2 d0 provided the least distance L between any
 *   two fasteners is at least 2.4 d0 (Fig. 3.1b), so a staggered pair of lines is held to those two;
 * - note 1: the maxima are unlimited except for compression members (local buckling, corrosion when
 *   exposed) and for exposed tension members (corrosion). The members checked here are in tension,
 *   so the maxima are checked only when `exposed` is true.
 *
 * @param input - d0, t and whichever of e1, e2, p1, p2, p2Staggered, L, eMax, pMax the layout has
 * @returns the rules broken (empty when none)
 * @example
 * en1993Detailing({ d0: 22, e1: 25, p1: 50 }) // → [{ quantity: 'e1', kind: 'minimum', value: 25, limit: 26.4, … }]
 * en1993Detailing({ d0: 22, p2Staggered: 30, L: 60 }) // → [] (30 ≥ 1.2 d0 = 26.4 and 60 ≥ 2.4 d0 = 52.8)
 */
export function en1993Detailing(input: DetailingInput): DetailingIssue[] {
  const issues: DetailingIssue[] = [];
  const d0 = input.d0;
  const min = (
    quantity: 'e1' | 'e2' | 'p1' | 'p2' | 'L',
    value: number | undefined,
    factor: number,
    what: string = quantity,
  ) => {
    if (value === undefined) return;
    const limit = factor * d0;
    if (value < limit - 1e-9) {
      issues.push({
        quantity,
        kind: 'minimum',
        value,
        limit,
        clause: 'EN 1993-1-8 Table 3.3',
        message: `${what} = ${fmt(value)} mm is below ${factor} d0 = ${fmt(limit)} mm`,
      });
    }
  };
  min('e1', input.e1, 1.2);
  min('e2', input.e2, 1.2);
  min('p1', input.p1, 2.2);
  min('p2', input.p2, 2.4);
  if (input.p2Staggered !== undefined) {
    // Table 3.3 note 5 (from memory): staggered rows p2 ≥ 1.2 d0 with L ≥ 2.4 d0.
    min('p2', input.p2Staggered, 1.2, 'p2 of staggered rows');
    min('L', input.L, 2.4, 'L, the least distance between two fasteners of staggered rows,');
  }
  if (input.t !== undefined && input.exposed === true) {
    const eLimit = 4 * input.t + 40;
    if (input.eMax !== undefined && input.eMax > eLimit + 1e-9) {
      issues.push({
        quantity: 'e',
        kind: 'maximum',
        value: input.eMax,
        limit: eLimit,
        clause: 'EN 1993-1-8 Table 3.3',
        message: `end or edge distance ${fmt(input.eMax)} mm exceeds 4t + 40 = ${fmt(eLimit)} mm (exposed member)`,
      });
    }
    const pLimit = Math.min(14 * input.t, 200);
    if (input.pMax !== undefined && input.pMax > pLimit + 1e-9) {
      issues.push({
        quantity: 'p',
        kind: 'maximum',
        value: input.pMax,
        limit: pLimit,
        clause: 'EN 1993-1-8 Table 3.3',
        message: `spacing ${fmt(input.pMax)} mm exceeds min(14t, 200) = ${fmt(pLimit)} mm (exposed member)`,
      });
    }
  }
  return issues;
}
