import { describe, expect, it } from 'vitest';
import { analyseMember } from './analyseMember.js';
import { EngineError } from './engineError.js';
import type { CodeProfile, MemberInput } from './types.js';

const LRFD: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const ASD: CodeProfile = { ...LRFD, method: 'ASD' };
const MM: CodeProfile = { standard: 'AISC 360-16', method: 'LRFD', units: 'mm' };

// AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1): PL 14 × 1/2, A36, 3/4 in bolts.
const d9: MemberInput = {
  id: 'D9',
  kind: 'plate',
  width: 14,
  thickness: 0.5,
  material: { grade: 'A36', Fy: 36, Fu: 58 },
  directions: ['-x', '+x'],
  holes: [
    { id: 'A', x: 0, y: 2, boltDiameter: 0.75, type: 'standard' },
    { id: 'B', x: 2.5, y: 5, boltDiameter: 0.75, type: 'standard' },
    { id: 'C', x: 2.5, y: 9, boltDiameter: 0.75, type: 'standard' },
    { id: 'D', x: 0, y: 12, boltDiameter: 0.75, type: 'standard' },
  ],
};

/** Three holes across at gauge 75 mm, centred (Holtz, CSA S16 course notes, Example T10, conformance/SOURCES.md R3). */
const holtz = (id: string, width: number, thickness: number, kind: MemberInput['kind']): MemberInput => ({
  id,
  kind,
  width,
  thickness,
  material: { grade: '350W', Fy: 350, Fu: 450 },
  directions: ['-x'],
  holes: [-75, 0, 75].map((dy, i) => ({
    id: `H${i + 1}`,
    x: 0,
    y: width / 2 + dy,
    type: 'standard' as const,
    dimension: { across: 22, along: 22 },
  })),
});

describe('analyseMember', () => {
  it('gives D.9 Ag 7.0, An 5.75 and Ae 5.75 in² with U = 1.0 (AISC Design Examples v13.0 D.9, published)', () => {
    const r = analyseMember(d9, LRFD);
    expect(r.Ag).toBe(7);
    expect(Math.abs(r.An - 5.75)).toBeLessThanOrEqual(0.025 + 1e-9);
    expect(r.U).toBe(1);
    expect(Math.abs(r.Ae - 5.75)).toBeLessThanOrEqual(0.025 + 1e-9);
    expect(r.directions.map((d) => d.governing?.holes.join('-'))).toEqual(['A-B-C-D', 'A-B-C-D']);
    expect(r.holeWidths.map((w) => w.deducted)).toEqual([0.875, 0.875, 0.875, 0.875]);
  });

  it('gives LRFD yielding 0.90 Fy Ag and rupture 0.75 Fu Ae, the lesser governing (AISC 360 D2)', () => {
    const r = analyseMember(d9, LRFD);
    expect(r.yielding).toEqual({ limitState: 'yielding', nominal: 252, factor: 0.9, available: 226.8 });
    expect(r.rupture.nominal).toBeCloseTo(58 * r.Ae, 10);
    expect(r.rupture.available).toBeCloseTo(0.75 * 58 * r.Ae, 10);
    expect(r.governing.limitState).toBe('yielding');
  });

  it('gives ASD Pn/1.67 and Pn/2.00', () => {
    const r = analyseMember(d9, ASD);
    expect(r.yielding.available).toBeCloseTo(252 / 1.67, 10);
    expect(r.rupture.factor).toBe(2);
    expect(r.rupture.available).toBeCloseTo((58 * r.Ae) / 2, 10);
  });

  it('keeps the k least chains per direction and the equal-share check', () => {
    const r = analyseMember(d9, LRFD, { k: 2 });
    expect(r.directions[0]!.leastChains).toHaveLength(2);
    expect(r.directions[0]!.share?.chain.holes).toEqual(['A', 'B', 'C', 'D']);
  });

  it('analyses only the directions asked for', () => {
    expect(analyseMember(d9, LRFD, { directions: ['+x'] }).directions.map((d) => d.direction)).toEqual([
      '+x',
    ]);
  });

  it('gives the utilisation when a required strength is given, none otherwise', () => {
    expect(analyseMember({ ...d9, requiredStrength: 180 }, LRFD).utilisation).toBeCloseTo(180 / 226.8, 12);
    expect(analyseMember(d9, LRFD)).not.toHaveProperty('utilisation');
  });

  it('uses the U given and reports Ae = An·U', () => {
    const r = analyseMember({ ...d9, U: 0.9 }, LRFD);
    expect(r.Ae).toBeCloseTo(0.9 * r.An, 12);
  });

  it('caps Ae at 0.85 Ag for bolted splice plates only, not for plates or gussets (AISC 360-16 J4.1(b))', () => {
    const plate: MemberInput = {
      ...d9,
      width: 10,
      thickness: 1,
      holes: [{ id: 'A', x: 0, y: 5, type: 'standard', dimension: { across: 0.4375, along: 0.4375 } }],
    };
    // An = (10 − 0.5) · 1 = 9.5; 0.85 Ag = 8.5.
    expect(analyseMember(plate, LRFD)).toMatchObject({ An: 9.5, Ae: 9.5, capped: false });
    expect(analyseMember({ ...plate, kind: 'splice-plate' }, LRFD)).toMatchObject({
      An: 9.5,
      Ae: 8.5,
      capped: true,
    });
    // J4.1(b) names bolted splice plates only; before this fix a gusset was capped too (Ae 8.5).
    expect(analyseMember({ ...plate, kind: 'gusset' }, LRFD)).toMatchObject({ Ae: 9.5, capped: false });
  });

  it('throws a module-prefixed error, not a negative strength, when the least chain leaves a net area ≤ 0', () => {
    // 2-1/2 × 1/2 plate, four 3/4 in bolts on gauge lines 1/2 in apart, staggered 0.7 in (no holes
    // overlap): wn = 2.5 − 4 · 0.875 + 3 · 0.7²/(4 · 0.5) = −0.265 in (AISC 360 B4.3b, s²/4g; common
    // practice). Before this check: An = −0.1325 in², rupture φPn = 0.75 · 58 · −0.1325 = −5.76 kip.
    const zigzag: MemberInput = {
      ...d9,
      width: 2.5,
      thickness: 0.5,
      holes: [0.5, 1, 1.5, 2].map((y, i) => ({
        id: 'ABCD'[i]!,
        x: i % 2 === 0 ? 0 : 0.7,
        y,
        boltDiameter: 0.75,
        type: 'standard' as const,
      })),
    };
    expect(() => analyseMember(zigzag, LRFD)).toThrow(
      /^ligament\/engine: member .*: chain A-B-C-D loaded from -x leaves a net area of -0\.132\d+, not positive \(rule net-area-positive\)$/,
    );
    expect(() => analyseMember(zigzag, LRFD)).toThrow(EngineError);
  });

  it('gives An = Ag without holes', () => {
    const r = analyseMember({ ...d9, holes: [] }, LRFD);
    expect(r).toMatchObject({ An: 7, Ae: 7 });
    expect(r.directions[0]).toMatchObject({ governing: null, leastChains: [], An: 7, share: null });
  });

  it('gives the Holtz T10 main plate wn 228 mm, An 5700 mm², 0.75·5700·450 = 1924 kN, gross 0.9·7500·350 = 2362 kN (published)', () => {
    const r = analyseMember(holtz('main', 300, 25, 'plate'), MM);
    expect(r.directions[0]!.governing!.netWidth).toBe(228);
    expect(r.An).toBe(5700);
    expect(Math.abs(r.rupture.available - 1924)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.yielding.available - 2362)).toBeLessThanOrEqual(1);
  });

  it('gives each Holtz T10 lap plate wn 148 mm, An 2072 mm², 1399 kN and 1940 kN for the pair (published)', () => {
    const r = analyseMember(holtz('lap', 220, 14, 'splice-plate'), MM);
    expect(r.directions[0]!.governing!.netWidth).toBe(148);
    expect(r.An).toBe(2072);
    expect(r.capped).toBe(false);
    expect(Math.abs(2 * r.rupture.available - 1399)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(2 * r.yielding.available - 1940)).toBeLessThanOrEqual(0.5);
  });

  it('throws an EngineError for a bolt size the hole table does not have', () => {
    const bad: MemberInput = { ...d9, holes: [{ id: 'X', x: 0, y: 7, boltDiameter: 0.8, type: 'standard' }] };
    expect(() => analyseMember(bad, LRFD)).toThrow(EngineError);
  });
});
