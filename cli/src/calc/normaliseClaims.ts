import type { LoadDirection } from '../engine/types.js';
import type { CalcReaders, Len, Raw } from './normaliseTypes.js';
import type { ClaimedChain, MemberClaims } from './types.js';

/**
 * A member's `claims` as the engine compares them: claimed chains with their net widths read as
 * lengths, the controlling chain, and the claimed areas, factors and strengths as given.
 *
 * @param raw - the schema-valid `claims` object
 * @param pointer - its JSON pointer, e.g. `/members/0/claims`
 * @param read - the file's readers, which collect the issues
 * @returns the claims
 * @example
 * normaliseClaims({ chains: [{ holes: ['A', 'D'], netWidth: '12-1/4' }], An: 5.75 }, '/members/0/claims', calcReaders('in'))
 * // → { chains: [{ holes: ['A', 'D'], netWidth: 12.25 }], An: 5.75 }
 */
export function normaliseClaims(raw: Raw, pointer: string, read: CalcReaders): MemberClaims {
  const length = read.length;
  const chain = (c: Raw, p: string): ClaimedChain => ({
    holes: c['holes'] as string[],
    ...(c['netWidth'] !== undefined ? { netWidth: length(c['netWidth'] as Len, `${p}/netWidth`) } : {}),
    ...(c['direction'] !== undefined ? { direction: c['direction'] as LoadDirection } : {}),
  });
  const out: { -readonly [K in keyof MemberClaims]: MemberClaims[K] } = {};
  if (raw['chains'] !== undefined)
    out.chains = (raw['chains'] as Raw[]).map((c, i) => chain(c, `${pointer}/chains/${i}`));
  if (raw['controllingChain'] !== undefined)
    out.controllingChain = chain(raw['controllingChain'] as Raw, `${pointer}/controllingChain`);
  for (const k of [
    'Ag',
    'An',
    'U',
    'Ae',
    'yielding',
    'rupture',
    'available',
    'Agv',
    'Anv',
    'Agt',
    'Ant',
    'blockShear',
  ] as const) {
    if (raw[k] !== undefined) out[k] = raw[k] as number;
  }
  return out;
}
