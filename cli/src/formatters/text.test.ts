import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCheck } from '../runner/check.js';
import { DEFAULT_COMMAND_LINE_TOLERANCE } from '../runner/tolerance.js';
import { formatText } from './text.js';

async function textOf(name: string): Promise<string[]> {
  const text = readFileSync(
    fileURLToPath(new URL(`../../../schema/examples/${name}`, import.meta.url)),
    'utf8',
  );
  const { result } = await runCheck([{ file: name, text }], {
    command: 'check',
    settings: { tolerance: DEFAULT_COMMAND_LINE_TOLERANCE, failOn: 'none', k: 10 },
    version: '0.1.0',
  });
  return formatText(result).split('\n');
}

// Issue 10.10: every number carries its unit (or sits under a heading naming it) at the file's
// precision. The values are the hand arithmetic in each example's meta.notes.
describe('formatText writes every quantity with the unit and precision of its file', () => {
  it('an inch file (AISC Design Examples v13.0 Ex. D.9 layout): in, in², kip to 0.001 in and 0.1 kip', async () => {
    const lines = await textOf('north-splice-correct.json');
    expect(lines.slice(0, 8)).toEqual([
      'north-splice-correct.json  (Harbour Lantern Footbridge · AISC 360-22 LRFD · in)',
      '  SP-N1  splice-plate  PL 0.500 × 14.000 in  A36  4 holes',
      '    dir  governing chain   wn in  An in²  equal share',
      '    -x   A1–B1–C1–D1      11.542   5.771  A1–B1–C1–D1 4/4 → 5.771 in²',
      '    +x   A1–B1–C1–D1      11.542   5.771  A1–B1–C1–D1 4/4 → 5.771 in²',
      '    Ag 7.000 in²   An 5.771 in² (-x)   U 1.000   Ae 5.771 in²',
      '    φPn yielding 226.8 kip   rupture 251.0 kip   governs yielding 226.8 kip   utilisation 0.794',
      '    no findings',
    ]);
  });

  it('a mm file (south-hanger-missed-chain): mm, mm², kN to 0.1 mm, whole mm² and 0.1 kN', async () => {
    const lines = await textOf('south-hanger-missed-chain.json');
    expect(lines.slice(0, 6)).toEqual([
      'south-hanger-missed-chain.json  (Harbour Lantern Footbridge · AISC 360-22 LRFD · mm)',
      '  H-S1  plate  PL 16.0 × 250.0 mm  A572 Gr. 345  4 holes',
      '    dir  governing chain  wn mm  An mm²  equal share',
      '    -x   H1–H2–H3–H4      186.7    2988  H1–H2–H3–H4 4/4 → 2988 mm²',
      '    Ag 4000 mm²   An 2988 mm² (-x)   U 1.000   Ae 2988 mm²',
      '    φPn yielding 1242.0 kN   rupture 1008.3 kN   governs rupture 1008.3 kN   utilisation 0.992',
    ]);
    expect(lines).toContain(
      '    south-hanger-missed-chain.json:41:19  ERROR   LG121 Governing chain H1-H2-H3-H4 for −x (net width 186.7 mm, An 2988 mm²) is not among the claimed chains; claimed An 3232 mm²  /members/0/claims/chains',
    );
  });
});

describe('formatText names each code by its own design method (issue 10.11)', () => {
  it('EN 1993-1-1 by its partial factors and CSA S16 as limit states design, never LRFD', async () => {
    expect((await textOf('lantern-deck-en1993.json'))[0]).toBe(
      'lantern-deck-en1993.json  (Harbour Lantern Footbridge · EN 1993-1-1, partial factors γM0 1.00, γM2 1.25 · mm)',
    );
    expect((await textOf('lantern-lap-csa.json'))[0]).toBe(
      'lantern-lap-csa.json  (Harbour Lantern Footbridge · CSA S16-19, limit states design φ 0.90, φu 0.75 · mm)',
    );
  });
});
