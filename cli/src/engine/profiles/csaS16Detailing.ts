import type { DetailingInput, DetailingIssue } from './types.js';

/**
 * CSA S16 bolt spacing: the centre-to-centre distance between bolts ≥ 2.7 d (22.3.1; published in
 * R3's course notes as "minimum pitch 2.7d"). It is measured between hole centres (L), not between
 * gauge lines: staggered bolts on lines closer than 2.7 d are fine when their centres are far enough
 * apart. Without L (a caller that measured only p1, p2), p1 and p2 are checked. The minimum edge
 * distances of S16 Table 6 were not found in a source we can cite and are not checked.
 *
 * @param input - bolt diameter and L (or the least spacings p1, p2)
 * @returns the rules broken
 * @example
 * csaS16Detailing({ d0: 22, boltDiameter: 20, L: 50 }) // → [{ quantity: 'L', kind: 'minimum', value: 50, limit: 54, … }]
 * csaS16Detailing({ d0: 22, boltDiameter: 20, p2: 40, L: 64 }) // → [] (staggered lines 40 apart, centres 64)
 */
export function csaS16Detailing(input: DetailingInput): DetailingIssue[] {
  if (input.boltDiameter === undefined) return [];
  const limit = 2.7 * input.boltDiameter;
  const issues: DetailingIssue[] = [];
  const quantities = input.L !== undefined ? (['L'] as const) : (['p1', 'p2'] as const);
  for (const quantity of quantities) {
    const value = input[quantity];
    if (value !== undefined && value < limit - 1e-9) {
      issues.push({
        quantity,
        kind: 'minimum',
        value,
        limit,
        clause: 'CSA S16 22.3.1',
        message: `${quantity === 'L' ? 'centre-to-centre spacing' : quantity} = ${Math.round(value * 10) / 10} mm is below 2.7 d = ${Math.round(limit * 10) / 10} mm`,
      });
    }
  }
  return issues;
}
