import { describe, expect, it } from 'vitest';
import * as draw from './index.js';

describe('draw index', () => {
  it('exports exactly the documented public surface (cli/README.md, Library)', () => {
    expect(Object.keys(draw).sort()).toEqual([
      'STROKES',
      'arrowHead',
      'buildDrawing',
      'chainPoints',
      'slotPath',
      'toSvg',
      'withClaimedChain',
    ]);
  });
});
