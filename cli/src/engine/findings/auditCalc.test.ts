import { describe, expect, it } from 'vitest';
import pkg from '../../../package.json' with { type: 'json' };
import { auditCalc } from './auditCalc.js';
import type { HoleInput, MemberInput } from '../types.js';
import type { AuditedCalc } from './types.js';

const bolt = (id: string, x: number, y: number): HoleInput => ({
  id,
  x,
  y,
  boltDiameter: 0.75,
  type: 'standard',
});
// AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1).
const d9: MemberInput = {
  id: 'SP-1',
  kind: 'splice-plate',
  width: 14,
  thickness: 0.5,
  material: { grade: 'A36', Fy: 36, Fu: 58 },
  directions: ['-x', '+x'],
  holes: [bolt('A1', 0, 2), bolt('B1', 2.5, 5), bolt('C1', 2.5, 9), bolt('D1', 0, 12)],
};

const doc: AuditedCalc = {
  profile: { standard: 'AISC 360-22', method: 'LRFD', units: 'in' },
  members: [
    { index: 0, input: d9, claims: { An: 5.75 } },
    { index: 1, input: { ...d9, id: 'SP-2' }, claims: { An: 6.1 } },
  ],
};

describe('auditCalc', () => {
  it('audits every member in file order under the document profile, stamped with the engine version', () => {
    const a = auditCalc(doc);
    expect(a.engineVersion).toBe(pkg.version);
    expect(a.profile).toEqual(doc.profile);
    expect(a.members.map((m) => [m.memberId, m.pointer, m.findings.map((f) => f.code)])).toEqual([
      ['SP-1', '/members/0', []],
      ['SP-2', '/members/1', ['LG101']],
    ]);
    expect(a.members[1]!.findings[0]!.pointer).toBe('/members/1/claims/An');
  });

  it('passes options through: k and directions', () => {
    const a = auditCalc(doc, { k: 1, directions: ['+x'] });
    expect(a.members[0]!.result.directions.map((d) => [d.direction, d.leastChains.length])).toEqual([
      ['+x', 1],
    ]);
  });

  it('gives no members for an empty document', () => {
    expect(auditCalc({ ...doc, members: [] }).members).toEqual([]);
  });
});
