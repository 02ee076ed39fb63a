import { describe, expect, it } from 'vitest';
import { makeFinding } from './makeFinding.js';
import { orderFindings } from './orderFindings.js';

const f = (code: string) => makeFinding(code, { message: code, pointer: '' });

describe('orderFindings', () => {
  it('lists input, overstated, missed chain, phantom chain, chain width, equal share, understated, detailing', () => {
    const raised = ['LG201', 'LG111', 'LG131', 'LG124', 'LG122', 'LG121', 'LG101', 'LG301'].map(f);
    expect(orderFindings(raised).map((x) => x.code)).toEqual([
      'LG301',
      'LG101',
      'LG121',
      'LG122',
      'LG124',
      'LG131',
      'LG111',
      'LG201',
    ]);
  });

  it('keeps the order findings of one class were raised in, and leaves its input alone', () => {
    const raised = [f('LG103'), f('LG101'), f('LG102')];
    expect(orderFindings(raised).map((x) => x.code)).toEqual(['LG103', 'LG101', 'LG102']);
    expect(raised.map((x) => x.code)).toEqual(['LG103', 'LG101', 'LG102']);
  });
});
