import { describe, expect, it } from 'vitest';
import { calcReaders } from './calcReaders.js';

describe('calcReaders', () => {
  it('reads fractions in an in file and keeps no issue', () => {
    const r = calcReaders('in');
    expect(r.length('2-1/8', '/members/0/width')).toBe(2.125);
    expect(r.bolt('3/4', '/members/0/holes/0/bolt')).toBe(0.75);
    expect(r.issues).toEqual([]);
  });

  it('a string length in a mm file is NaN and the rule mm-plain-number, at its pointer', () => {
    const r = calcReaders('mm');
    expect(r.length('75', '/members/0/holes/1/y')).toBeNaN();
    expect(r.issues).toEqual([
      expect.objectContaining({ pointer: '/members/0/holes/1/y', rule: 'mm-plain-number' }),
    ]);
  });

  it('metric bolts only in mm files (rule bolt-units), inch fractions only in in files', () => {
    const mm = calcReaders('mm');
    expect(mm.bolt('M20', '/b')).toBe(20);
    expect(mm.bolt('3/4', '/c')).toBeNaN();
    const inch = calcReaders('in');
    expect(inch.bolt('M20', '/d')).toBe(20);
    expect([...mm.issues, ...inch.issues].map((i) => [i.pointer, i.rule])).toEqual([
      ['/c', 'bolt-units'],
      ['/d', 'bolt-units'],
    ]);
  });

  it('a bad fraction keeps the rule parseLength names', () => {
    const r = calcReaders('in');
    expect(r.length('3/0', '/x')).toBeNaN();
    expect(r.issues[0]!.pointer).toBe('/x');
    expect(r.issues[0]!.message).toMatch(/^\/x: .* \(rule [a-z-]+\)$/);
  });
});
