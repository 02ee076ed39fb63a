import { describe, expect, it } from 'vitest';
import { aisc, d9, d9Result } from './drawing.fixtures.js';
import { titleBlock } from './titleBlock.js';
import type { TextShape } from './types.js';

const texts = (shapes: ReturnType<typeof titleBlock>) =>
  shapes.filter((s): s is TextShape => s.kind === 'text').map((t) => t.text);

describe('titleBlock', () => {
  it('D.9: member and kind, scale, Ag 7 in², An and Ae 5.771 in² (published 5.75), φPn 0.90 · 36 · 7 = 226.8 kips', () => {
    const lines = texts(
      titleBlock(
        d9,
        d9Result,
        { units: 'in', profile: aisc, project: 'Harbour Lantern Footbridge' },
        164,
        168.12,
        5,
      ),
    );
    expect(lines[0]).toBe('D9 — plate');
    expect(lines[1]).toBe('SCALE 1:5');
    expect(lines[3]).toBe('Ag 7.000 in² · An 5.771 in² (−x) · U 1.000 · Ae 5.771 in²');
    expect(lines[4]).toBe('φPn 226.8 kip (yielding governs) · AISC 360-22 LRFD');
    expect(lines[5]).toBe('Harbour Lantern Footbridge · dimensions in inches · holes drawn at nominal size');
  });

  it('the caution line along the foot of the sheet, when given', () => {
    const shapes = titleBlock(d9, d9Result, { units: 'in', caution: 'A checking aid.' }, 164, 168.12, 5);
    expect(shapes.at(-1)).toMatchObject({
      kind: 'text',
      role: 'caution',
      text: 'A checking aid.',
      at: [82, 168.12 - 8.5],
    });
  });
});
