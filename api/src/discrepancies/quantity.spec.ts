import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { auditCalc, loadCalcText } from 'ligament';
import { quantityOf, unitOf } from './quantity.js';

/** Every finding with numbers in the demo's calc files and the schema's examples (fictional data). */
function findings() {
  const dirs = [
    join(__dirname, '..', 'seed', 'calc', 'rev-a'),
    join(__dirname, '..', 'seed', 'calc', 'rev-b'),
    join(__dirname, '..', '..', '..', 'schema', 'examples'),
  ];
  return dirs.flatMap((dir) =>
    readdirSync(dir)
      .filter((f) => f.endsWith('.json'))
      .flatMap((name) => {
        const loaded = loadCalcText(readFileSync(join(dir, name), 'utf8'), name);
        if (!loaded.ok) return [];
        const units = loaded.document.profile.units;
        return auditCalc(loaded.document).members.flatMap((m) =>
          m.findings
            .filter((f) => f.claimed !== undefined || f.recomputed !== undefined)
            .map((f) => ({ finding: f, units, file: name })),
        );
      }),
  );
}

describe('quantityOf', () => {
  const all = findings();

  it('names the quantity of every finding with numbers, in the unit its own message uses', () => {
    expect(all.length).toBeGreaterThan(20);
    for (const { finding, units, file } of all) {
      const q = quantityOf(finding);
      expect({ file, code: finding.code, pointer: finding.pointer, named: q !== null }).toEqual({
        file,
        code: finding.code,
        pointer: finding.pointer,
        named: true,
      });
      if (q && q.dimension !== 'ratio') expect(finding.message).toContain(unitOf(q.dimension, units));
    }
  });

  it('reads claims, chains, detailing distances and U from the pointer and class', () => {
    const f = (pointer: string, code = 'LG101', cls = 'overstated') =>
      quantityOf({ pointer, code, class: cls });
    expect(f('/members/0/claims/An')).toEqual({ quantity: 'An', dimension: 'area' });
    expect(f('/members/2/claims/rupture')).toEqual({ quantity: 'rupture strength', dimension: 'force' });
    expect(f('/members/0/claims/chains/1', 'LG124', 'chain-width')).toEqual({
      quantity: 'net width',
      dimension: 'length',
    });
    expect(f('/members/0/claims/chains', 'LG121', 'missed-chain')?.quantity).toBe('An');
    expect(f('/members/0/holes/3', 'LG201', 'detailing')).toEqual({
      quantity: 'spacing',
      dimension: 'length',
    });
    expect(f('/members/0/load/shearLag', 'LG104', 'overstated')).toEqual({
      quantity: 'U',
      dimension: 'ratio',
    });
    expect(f('/members/0/meta')).toBeNull();
  });

  it('gives the unit of each system, 1 for a ratio, nothing for an unknown system', () => {
    expect(unitOf('area', 'in')).toBe('in²');
    expect(unitOf('force', 'mm')).toBe('kN');
    expect(unitOf('ratio', 'mm')).toBe('1');
    expect(unitOf('length', null)).toBe('');
  });
});
