import { describe, expect, it } from 'vitest';
import { formatDirection } from './formatDirection.js';

describe('formatDirection', () => {
  it('writes directions with a true minus sign', () => {
    expect(formatDirection('-x')).toBe('−x');
    expect(formatDirection('+x')).toBe('+x');
  });
});
