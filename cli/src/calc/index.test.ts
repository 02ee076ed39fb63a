import { describe, expect, it } from 'vitest';
import * as calc from './index.js';

describe('calc index', () => {
  it('exports exactly the documented public surface (cli/README.md, Library)', () => {
    expect(Object.keys(calc).sort()).toEqual([
      'CALC_SCHEMA',
      'SCHEMA_ID',
      'SCHEMA_VERSION',
      'diffDocuments',
      'loadCalcText',
    ]);
  });
});
