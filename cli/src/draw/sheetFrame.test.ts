import { describe, expect, it } from 'vitest';
import { d9, d9Frame, d9Result } from './drawing.fixtures.js';
import { sheetFrame } from './sheetFrame.js';

describe('sheetFrame', () => {
  it('D.9 at the first standard scale that fits, 1:5, on a sheet wide enough for the title block', () => {
    expect(d9Frame).toMatchObject({ units: 'in', scale: 5, W: 14, top: 26 });
    expect(d9Frame.k).toBeCloseTo(5.08, 12);
    expect(d9Frame.sheetW).toBe(164);
    expect(d9Frame.sheetH).toBeCloseTo(168.12, 9);
    expect(d9Frame.left).toBeCloseTo(52.426, 9);
    expect(d9Frame.right - d9Frame.left).toBeCloseTo(8.1 * 5.08, 9);
    expect(d9Frame.bottom - d9Frame.top).toBeCloseTo(14 * 5.08, 9);
  });

  it('maps member x to the right and member y up the sheet', () => {
    expect(d9Frame.X(0)).toBeCloseTo(52.426 + 2.8 * 5.08, 9);
    expect(d9Frame.Y(0)).toBeCloseTo(d9Frame.bottom, 9);
    expect(d9Frame.Y(14)).toBeCloseTo(d9Frame.top, 9);
  });

  it('a mm plate without holes, 300 wide and 300 + 2 · 60 long: 1:2.5 fits it in 120 × 168 mm; 3000 wide, 1:25', () => {
    const metric = { ...d9, width: 300, holes: [] };
    expect(sheetFrame(metric, { ...d9Result, holeWidths: [] }, 'mm').scale).toBe(2.5);
    expect(sheetFrame({ ...metric, width: 3000 }, { ...d9Result, holeWidths: [] }, 'mm').scale).toBe(25);
  });
});
