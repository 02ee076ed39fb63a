import { describe, expect, it } from 'vitest';
import { analyseModel } from '../analyseModel.js';
import { memberModel } from '../member/memberModel.js';
import { d9Member } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { scopeOf } from './auditScope.fixtures.js';
import { claimedChainFindings } from './claimedChainFindings.js';
import type { MemberClaims } from './types.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
// AISC Design Examples v13.0 D.9 (conformance/SOURCES.md R1), loaded from either end.
const model = memberModel(d9Member, AISC);
const result = analyseModel(model);
const judge = (claims: MemberClaims) => claimedChainFindings(model, result, claims, scopeOf('D9'));

describe('claimedChainFindings', () => {
  it('LG122 for a chain that cannot form: the line of A–B runs on at x = 2.5 through C, both ways', () => {
    const { findings, admissible } = judge({ chains: [{ holes: ['A', 'B'] }] });
    expect(findings).toEqual([
      expect.objectContaining({ code: 'LG122', severity: 'warning', pointer: '/members/0/claims/chains/0' }),
    ]);
    // 14 − 2 · 0.875 + 2.5²/(4 · 3) = 12.77 in.
    expect(findings[0]!.message).toBe(
      'Claimed chain A-B (12.771 in) cannot form under the full load: hole C lies exactly on its fracture line for −x; hole C lies exactly on its fracture line for +x',
    );
    expect(admissible).toEqual([]);
  });

  it('LG123 for ids that are not a chain, at the offending id', () => {
    const { findings } = judge({ chains: [{ holes: ['A', 'X'] }] });
    expect(findings.map((f) => [f.code, f.pointer])).toEqual([
      ['LG123', '/members/0/claims/chains/0/holes/1'],
    ]);
    expect(findings[0]!.message).toBe('Claimed chain A-X does not exist: hole X is not in the member');
  });

  it('LG124 for a claimed net width above the recomputed 11.54 in (published 11.5), and the chain is admissible both ways', () => {
    const { findings, admissible } = judge({ chains: [{ holes: ['A', 'B', 'C', 'D'], netWidth: 12 }] });
    expect(findings.map((f) => [f.code, f.severity, f.pointer])).toEqual([
      ['LG124', 'error', '/members/0/claims/chains/0/netWidth'],
    ]);
    expect(admissible.map((c) => [c.chain.holes.join('-'), c.directions])).toEqual([
      ['A-B-C-D', ['-x', '+x']],
    ]);
  });

  it('LG125 for a controlling chain wider than the governing one: A–D straight, 14 − 2 · 0.875 = 12.25 in', () => {
    const { findings } = judge({ controllingChain: { holes: ['A', 'D'], direction: '-x' } });
    expect(findings).toEqual([
      expect.objectContaining({ code: 'LG125', chain: ['A', 'B', 'C', 'D'], claimed: 12.25 }),
    ]);
  });
});
