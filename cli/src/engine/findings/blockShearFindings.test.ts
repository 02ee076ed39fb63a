import { describe, expect, it } from 'vitest';
import { analyseMember } from '../analyseMember.js';
import { braceMember, d9Member } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { scopeOf } from './auditScope.fixtures.js';
import { blockShearFindings } from './blockShearFindings.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
// L4x4x3/8 brace: block shear φRn 81.12 kips (by hand, common practice) below tensile yielding
// 0.90 · 36 · 2.86 = 92.7 kips.
const brace = analyseMember(braceMember, AISC);

describe('blockShearFindings', () => {
  it('LG132 when block shear governs and neither it nor an available strength is claimed', () => {
    const [f] = blockShearFindings(brace, { An: 2.532 }, scopeOf('B'));
    expect(f).toMatchObject({ code: 'LG132', severity: 'warning', pointer: '/members/0/blockShear' });
    expect(f!.recomputed).toBeCloseTo(81.1195, 3);
    expect(f!.message).toBe(
      'Block shear 81.1 kip (AISC 360 J4.3) is below the tensile yielding strength 92.7 kip',
    );
  });

  it('nothing when a block shear or available strength is claimed (compared as LG103/LG106 instead)', () => {
    expect(blockShearFindings(brace, { available: 81.12 }, scopeOf('B'))).toEqual([]);
    expect(blockShearFindings(brace, { blockShear: 81.12 }, scopeOf('B'))).toEqual([]);
  });

  it('nothing without block shear input (D.9)', () => {
    expect(blockShearFindings(analyseMember(d9Member, AISC), {}, scopeOf('D9'))).toEqual([]);
  });
});
