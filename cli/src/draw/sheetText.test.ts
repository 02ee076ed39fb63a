import { describe, expect, it } from 'vitest';
import { sheetText } from './sheetText.js';

describe('sheetText', () => {
  it('is centred on its point unless told otherwise', () => {
    expect(sheetText([10, 20], 'A', 2.3, 'hole-id')).toEqual({
      kind: 'text',
      at: [10, 20],
      text: 'A',
      size: 2.3,
      anchor: 'middle',
      role: 'hole-id',
    });
    expect(sheetText([0, 0], 'x', 2.5, 'label', { anchor: 'start', italic: true })).toMatchObject({
      anchor: 'start',
      italic: true,
    });
  });
});
