import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { memberSection } from './memberSection.js';

describe('memberSection', () => {
  it('builds the shape the input names; a double angle is one angle of two pieces', () => {
    expect(memberSection({ shape: 'angle', a: 6, b: 6, t: 0.625, pieces: 2 }).pieces).toBe(2);
    expect(
      memberSection({ shape: 'w-shape', d: 14, bf: 10, tf: 0.72, tw: 0.415 }).elements.map((e) => e.id),
    ).toEqual(['flange-1', 'web', 'flange-2']);
    const tees = memberSection({ shape: 'tee', d: 8.13, bf: 7.07, tf: 0.628, tw: 0.38, pieces: 2 });
    expect([tees.pieces, tees.designation.startsWith('2 × ')]).toEqual([2, true]);
  });

  it('names the dimensions a shape is missing, and refuses a fractional piece count', () => {
    expect(() => memberSection({ shape: 'channel', d: 8, bf: 2.26 })).toThrow(EngineError);
    expect(() => memberSection({ shape: 'channel', d: 8, bf: 2.26 })).toThrow(/needs tf, tw/);
    expect(() => memberSection({ shape: 'tee', d: 8, bf: 7, tf: 0.6, tw: 0.4, pieces: 1.5 })).toThrow(
      /whole number/,
    );
  });
});
