import type { Finding, FindingClass } from './types.js';

/**
 * The order a member's findings are listed in: what makes the file or the result unusable first,
 * then what is unsafe, then what is conservative, then detailing. (The reading order of the classes
 * themselves, for summaries and charts, is FINDING_CLASSES.)
 */
const LISTING: readonly FindingClass[] = [
  'input',
  'overstated',
  'missed-chain',
  'phantom-chain',
  'chain-width',
  'equal-share',
  'understated',
  'detailing',
];

/**
 * A member's findings in listing order: input, overstated, missed chain, phantom chain, chain width,
 * equal share, understated, detailing; findings of one class keep the order they were raised in.
 *
 * @param findings - the findings as raised
 * @returns a new array, ordered
 * @example
 * orderFindings([lg201, lg111, lg101]).map((f) => f.code) // → ['LG101', 'LG111', 'LG201']
 */
export function orderFindings(findings: readonly Finding[]): Finding[] {
  const rank = new Map(LISTING.map((c, i) => [c, i] as const));
  return findings
    .map((f, i) => ({ f, i }))
    .sort((a, b) => rank.get(a.f.class)! - rank.get(b.f.class)! || a.i - b.i)
    .map((e) => e.f);
}
