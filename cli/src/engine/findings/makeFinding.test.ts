import { describe, expect, it } from 'vitest';
import { makeFinding } from './makeFinding.js';

describe('makeFinding', () => {
  it('takes name, class and default severity from the catalogue', () => {
    expect(makeFinding('LG202', { message: 'm', pointer: '/members/0/holes/1' })).toEqual({
      code: 'LG202',
      name: 'edge-distance-below-minimum',
      class: 'detailing',
      severity: 'warning',
      message: 'm',
      pointer: '/members/0/holes/1',
    });
  });

  it('lets a case raise or lower the severity', () => {
    expect(makeFinding('LG122', { severity: 'error', message: 'm', pointer: '' }).severity).toBe('error');
  });
});
