import { describe, expect, it } from 'vitest';
import {
  collectTolerance,
  describeTolerance,
  parseToleranceValue,
  resolveTolerance,
  ToleranceError,
} from './tolerance.js';

describe('tolerance', () => {
  it('parseToleranceValue reads a percentage as a relative tolerance', () => {
    expect(parseToleranceValue('0.5%')).toEqual({ relative: 0.005 });
    expect(parseToleranceValue(' 2% ')).toEqual({ relative: 0.02 });
  });

  it('parseToleranceValue reads absolute values by unit into a dimension', () => {
    const cases: [string, string, string, number][] = [
      ['0.02in', 'length', 'in', 0.02],
      ['0.5mm', 'length', 'mm', 0.5],
      ['0.01in2', 'area', 'in', 0.01],
      ['5mm2', 'area', 'mm', 5],
      ['1kip', 'force', 'in', 1],
      ['2kN', 'force', 'mm', 2],
    ];
    for (const [text, dimension, units, value] of cases) {
      expect(parseToleranceValue(text)).toEqual({ absolute: { dimension, units, value, text } });
    }
  });

  it('rejects unknown units, missing numbers and 100 % or more', () => {
    expect(() => parseToleranceValue('3ft')).toThrow(ToleranceError);
    expect(() => parseToleranceValue('3ft')).toThrow('unknown unit "ft"');
    expect(() => parseToleranceValue('in')).toThrow('is not a tolerance');
    expect(() => parseToleranceValue('-1%')).toThrow('is not a tolerance');
    expect(() => parseToleranceValue('100%')).toThrow('not below 100%');
  });

  it('collectTolerance keeps one value per dimension, the last one given', () => {
    let spec = collectTolerance('1%', undefined);
    spec = collectTolerance('0.02in', spec);
    spec = collectTolerance('0.03in', spec);
    spec = collectTolerance('1kip', spec);
    expect(spec.relative).toBe(0.01);
    expect(spec.absolute.map((a) => a.text)).toEqual(['0.03in', '1kip']);
    expect(describeTolerance(spec)).toBe('1%, 0.03in, 1kip');
  });

  it('resolveTolerance converts absolute values to the file units (1 in = 25.4 mm, 1 kip = 4.448 kN)', () => {
    const spec = collectTolerance('1kip', collectTolerance('0.01in2', collectTolerance('0.02in', undefined)));
    expect(resolveTolerance(spec, 'in')).toEqual({
      relative: 0.005,
      absolute: { length: 0.02, area: 0.01, force: 1 },
    });
    const mm = resolveTolerance(spec, 'mm');
    expect(mm.absolute!.length).toBeCloseTo(0.508, 9);
    expect(mm.absolute!.area).toBeCloseTo(6.4516, 9);
    expect(mm.absolute!.force).toBeCloseTo(4.4482216, 6);
    expect(resolveTolerance(collectTolerance('0.5mm', undefined), 'in').absolute!.length).toBeCloseTo(
      0.5 / 25.4,
      12,
    );
  });
});
