import { describe, expect, it } from 'vitest';
import { analyseModel } from '../analyseModel.js';
import { memberModel } from '../member/memberModel.js';
import { d9Member } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { scopeOf } from './auditScope.fixtures.js';
import { claimedChainFindings } from './claimedChainFindings.js';
import { missedChainFindings } from './missedChainFindings.js';
import type { MemberClaims } from './types.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
// AISC Design Examples v13.0 D.9 (conformance/SOURCES.md R1): A–B–C–D governs both ways at 11.54 in.
const model = memberModel({ ...d9Member, directions: ['-x'] }, AISC);
const result = analyseModel(model);
const missed = (claims: MemberClaims) =>
  missedChainFindings(
    result,
    claims,
    claimedChainFindings(model, result, claims, scopeOf('D9')).admissible,
    0.5,
    scopeOf('D9'),
  );

describe('missedChainFindings', () => {
  it('LG121, an error, when only the straight chain A–D (12.25 in, An 6.125 in²) is claimed', () => {
    const [f] = missed({ chains: [{ holes: ['A', 'D'] }] });
    expect(f).toMatchObject({
      code: 'LG121',
      severity: 'error',
      direction: '-x',
      chain: ['A', 'B', 'C', 'D'],
      claimed: 6.125,
      pointer: '/members/0/claims/chains',
    });
    expect(f!.recomputed).toBeCloseTo(5.770833, 6);
  });

  it('a warning when the claimed An is already at or below the governing net area', () => {
    expect(missed({ chains: [{ holes: ['A', 'D'] }], An: 5.75 })[0]!.severity).toBe('warning');
  });

  it('nothing when the governing chain is claimed, or when no chains are claimed at all', () => {
    expect(missed({ chains: [{ holes: ['A', 'B', 'C', 'D'] }] })).toEqual([]);
    expect(missed({ An: 6.1 })).toEqual([]);
  });
});
