import { describe, expect, it } from 'vitest';
import { chainLabel, columns, pad, xmlEscape } from './common.js';

describe('formatter helpers', () => {
  it('columns aligns cells, counting ² and – as one character each', () => {
    expect(
      columns(
        [
          ['dir', 'An in²'],
          ['-x', '5.771'],
        ],
        ['left', 'right'],
      ),
    ).toEqual(['dir  An in²', '-x    5.771']);
    expect(pad('A1–B1', 7)).toBe('A1–B1  ');
  });

  it('chainLabel joins hole ids with en dashes so ids with hyphens stay readable', () => {
    expect(chainLabel(['H-1', 'H-2'])).toBe('H-1–H-2');
    expect(chainLabel([])).toBe('—');
  });

  it('xmlEscape escapes markup and drops characters XML cannot hold', () => {
    expect(xmlEscape('a<b & "c"\u0001')).toBe('a&lt;b &amp; &quot;c&quot;');
  });
});
