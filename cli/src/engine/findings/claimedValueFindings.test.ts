import { describe, expect, it } from 'vitest';
import { analyseMember } from '../analyseMember.js';
import { braceMember, d9Member } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { scopeOf } from './auditScope.fixtures.js';
import { claimedValueFindings } from './claimedValueFindings.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
// AISC Design Examples v13.0 D.9 (conformance/SOURCES.md R1): An 5.7708 in² recomputed, 5.75 published.
const d9 = analyseMember(d9Member, AISC);

describe('claimedValueFindings', () => {
  it('LG101: a claimed An above the recomputed one, with the governing chain and the difference', () => {
    const [f] = claimedValueFindings(d9, { An: 6.1 }, scopeOf('D9'));
    expect(f).toMatchObject({
      code: 'LG101',
      severity: 'error',
      claimed: 6.1,
      pointer: '/members/0/claims/An',
    });
    // 14 − 4 · 0.875 + 2 · 2.5²/(4 · 3) = 11.5417 in × 0.5 in; (6.10 − 5.7708) / 5.7708 = 5.7 %.
    expect(f!.recomputed).toBeCloseTo(5.770833, 6);
    expect(f!.message).toBe(
      'Claimed An 6.100 in² exceeds the recomputed 5.771 in² (chain A-B-C-D, −x) by 5.7 %',
    );
  });

  it('nothing for the published An 5.75 in² (0.36 % off, inside the default 0.5 %)', () => {
    expect(claimedValueFindings(d9, { An: 5.75, Ag: 7 }, scopeOf('D9'))).toEqual([]);
  });

  it('LG115 / LG113: understated values are notes, in the order Ag, An, U, Ae, yielding, rupture, available', () => {
    // φPn yielding 0.90 · 36 · 7 = 226.8 kips.
    const found = claimedValueFindings(d9, { yielding: 200, Ag: 6.5 }, scopeOf('D9'));
    expect(found.map((f) => [f.code, f.severity, f.pointer])).toEqual([
      ['LG115', 'note', '/members/0/claims/Ag'],
      ['LG113', 'note', '/members/0/claims/yielding'],
    ]);
    expect(found[1]!.recomputed).toBeCloseTo(226.8, 9);
  });

  it('compares a claimed available strength with the least of yielding, rupture and block shear', () => {
    // L4x4x3/8 brace: block shear φRn 81.12 kips by hand (common practice) governs.
    const brace = analyseMember(braceMember, AISC);
    const [f] = claimedValueFindings(brace, { available: 92.7 }, scopeOf('B'));
    expect(f!.code).toBe('LG103');
    expect(f!.recomputed).toBeCloseTo(81.1195, 3);
    expect(f!.message).toContain('block shear governs');
  });
});
