import { beforeEach, describe, expect, it, vi } from 'vitest';
import { d9Member } from '../members.fixtures.js';
import type { CodeProfile, HoleInput } from '../types.js';
import { auditMember } from './auditMember.js';
import type { CalcMember } from './types.js';

// Counters on the three steps a member model is built from, wrapped around the real functions: the
// audit must build each member once, however many of its parts (analysis, claimed chains, grazing,
// detailing) look at it.
const calls = vi.hoisted(() => ({ unfold: 0, holeWidth: 0, layout: 0 }));
vi.mock('../sections/unfold.js', async (real) => {
  const m = await real<typeof import('../sections/unfold.js')>();
  return { ...m, unfold: (...a: Parameters<typeof m.unfold>) => (calls.unfold++, m.unfold(...a)) };
});
vi.mock('../holes/memberHoleWidth.js', async (real) => {
  const m = await real<typeof import('../holes/memberHoleWidth.js')>();
  return {
    ...m,
    memberHoleWidth: (...a: Parameters<typeof m.memberHoleWidth>) => (
      calls.holeWidth++,
      m.memberHoleWidth(...a)
    ),
  };
});
vi.mock('../member/memberLayout.js', async (real) => {
  const m = await real<typeof import('../member/memberLayout.js')>();
  return {
    ...m,
    memberLayout: (...a: Parameters<typeof m.memberLayout>) => (calls.layout++, m.memberLayout(...a)),
  };
});

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };

const legHole = (id: string, x: number, element = 'leg-a', gauge = 2.5): HoleInput => ({
  id,
  x,
  y: Number.NaN,
  element,
  gauge,
  boltDiameter: 0.75,
  type: 'standard',
});
// L4x4x3/8 brace with holes in both legs, claims on chains and areas, block shear and shear lag data:
// every part of the audit that looks at the unfolded section has something to do.
const brace: CalcMember = {
  index: 0,
  input: {
    id: 'B',
    kind: 'angle',
    width: 7.625,
    thickness: 0.375,
    material: { Fy: 36, Fu: 58 },
    directions: ['-x', '+x'],
    section: { shape: 'angle', a: 4, b: 4, t: 0.375, tabulatedAg: 2.86 },
    holes: [legHole('A1', 0), legHole('A2', 3), legHole('B1', 1.5, 'leg-b'), legHole('B2', 4.5, 'leg-b')],
    shearLag: { connected: 'leg', length: 4.5, xbar: 1.13, fastenersPerLine: 2 },
    blockShear: { endDistance: 1.5 },
  },
  claims: {
    chains: [{ holes: ['A1', 'B1'], netWidth: 5.5 }, { holes: ['A2'] }],
    controllingChain: { holes: ['A1', 'B1'] },
    An: 2.2,
  },
};
// AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1), claimed with a chain A–B that
// cannot form from either end (its line runs on at x = 2.5 through C).
const d9: CalcMember = {
  index: 0,
  input: d9Member,
  claims: {
    chains: [{ holes: ['A', 'B'] }, { holes: ['A', 'B', 'C', 'D'] }],
    controllingChain: { holes: ['A', 'D'] },
  },
};

describe('auditMember builds each member once', () => {
  beforeEach(() => {
    calls.unfold = 0;
    calls.holeWidth = 0;
    calls.layout = 0;
  });

  it('a section member is unfolded once and its hole widths found once, under AISC and EN detailing', () => {
    const aisc = auditMember(brace, AISC);
    expect(aisc.findings.length).toBeGreaterThan(0);
    expect(calls).toEqual({ unfold: 1, holeWidth: 4, layout: 0 });
    calls.unfold = 0;
    calls.holeWidth = 0;
    const metric: CalcMember = {
      ...brace,
      input: {
        ...brace.input,
        width: 193.7,
        thickness: 9.5,
        material: { Fy: 235, Fu: 360 },
        section: { shape: 'angle', a: 100, b: 100, t: 9.5 },
        holes: brace.input.holes.map((h) => ({ ...h, x: h.x * 25.4, gauge: 60, boltDiameter: 20 })),
        shearLag: { connected: 'leg', fastenersPerLine: 2 },
        blockShear: { endDistance: 40 },
      },
      claims: { chains: [{ holes: ['A1', 'B1'] }] },
    };
    auditMember(metric, EN);
    expect(calls).toEqual({ unfold: 1, holeWidth: 4, layout: 0 });
  });

  it('a plate gets its hole widths once and its layout once', () => {
    const a = auditMember(d9, AISC);
    expect(a.findings.map((f) => f.code)).toContain('LG122');
    expect(calls).toEqual({ unfold: 0, holeWidth: 4, layout: 1 });
  });
});
