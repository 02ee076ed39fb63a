import type { DetailingInput, DetailingIssue } from './types.js';

/**
 * CSA S16 bolt spacing: pitch (centre-to-centre) ≥ 2.7 d (22.3.1; published in R3's course notes). The
 * minimum edge distances of S16 Table 6 were not found in a source we can cite and are not checked.
 *
 * @param input - bolt diameter and the least spacings p1, p2
 * @returns the rules broken
 * @example
 * csaS16Detailing({ d0: 22, boltDiameter: 20, p1: 50 }) // → [{ quantity: 'p1', kind: 'minimum', value: 50, limit: 54, … }]
 */
export function csaS16Detailing(input: DetailingInput): DetailingIssue[] {
  if (input.boltDiameter === undefined) return [];
  const limit = 2.7 * input.boltDiameter;
  const issues: DetailingIssue[] = [];
  for (const quantity of ['p1', 'p2'] as const) {
    const value = input[quantity];
    if (value !== undefined && value < limit - 1e-9) {
      issues.push({
        quantity,
        kind: 'minimum',
        value,
        limit,
        clause: 'CSA S16 22.3.1',
        message: `${quantity} = ${value} mm is below 2.7 d = ${Math.round(limit * 10) / 10} mm`,
      });
    }
  }
  return issues;
}
