import { describe, expect, it } from 'vitest';
import { LengthError, parseLength } from './parseLength.js';

describe('parseLength', () => {
  it('reads mixed numbers, fractions, whole numbers and decimals written as strings', () => {
    expect(parseLength('2-1/8')).toBe(2.125);
    expect(parseLength('15/16')).toBe(0.9375);
    expect(parseLength('3')).toBe(3);
    expect(parseLength('1.5')).toBe(1.5);
    expect(parseLength('1-7/8')).toBe(1.875);
    expect(parseLength(' 13/16 ')).toBe(0.8125);
  });

  it('passes finite numbers through unchanged', () => {
    expect(parseLength(14)).toBe(14);
    expect(parseLength(0.375)).toBe(0.375);
  });

  it('accepts negative values only when asked (x coordinates) and zero only when asked (y)', () => {
    expect(parseLength('-3/4', { allowNegative: true })).toBe(-0.75);
    expect(parseLength('-2-1/2', { allowNegative: true })).toBe(-2.5);
    expect(parseLength(0, { allowZero: true })).toBe(0);
    expect(Object.is(parseLength('-0', { allowNegative: true }), 0)).toBe(true);
    expect(() => parseLength(-1)).toThrow('-1 is negative; it must be greater than zero');
    expect(() => parseLength('-3/4', { allowZero: true })).toThrow(
      '"-3/4" is negative; it must be zero or more',
    );
  });

  it('rejects zero as a length with the rule positive-length', () => {
    expect(() => parseLength('0')).toThrow('"0" must be greater than zero');
    expect(() => parseLength('0/4')).toThrow(LengthError);
    try {
      parseLength(0);
    } catch (err) {
      expect((err as LengthError).rule).toBe('positive-length');
    }
  });

  it('rejects a zero denominator, naming the text', () => {
    expect(() => parseLength('1/0')).toThrow('"1/0" divides by zero');
    expect(() => parseLength('2-1/0')).toThrow('"2-1/0" divides by zero');
  });

  it('rejects a mixed number whose fraction is 1 or more', () => {
    expect(() => parseLength('2-5/4')).toThrow('the fraction of a mixed number must be less than 1');
  });

  it('rejects empty, non-numeric and non-finite input with the rule fraction or finite-number', () => {
    expect(() => parseLength('')).toThrow('an empty string is not a length');
    expect(() => parseLength('NaN')).toThrow('"NaN" is not a length');
    expect(() => parseLength('Infinity')).toThrow('"Infinity" is not a length');
    expect(() => parseLength('2 1/8')).toThrow('"2 1/8" is not a length');
    expect(() => parseLength('1e3')).toThrow(LengthError);
    expect(() => parseLength(Number.NaN)).toThrow('NaN is not a finite number');
    expect(() => parseLength(Number.POSITIVE_INFINITY)).toThrow('Infinity is not a finite number');
    const rules = ['NaN', ''].map((t) => {
      try {
        parseLength(t);
        return 'none';
      } catch (err) {
        return (err as LengthError).rule;
      }
    });
    expect(rules).toEqual(['fraction', 'fraction']);
  });
});
