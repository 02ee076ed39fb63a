import type { Drawing } from 'ligament/draw';
import { describe, expect, it } from 'vitest';
import {
  clampView,
  MIN_TEXT_PX,
  panBy,
  smallestText,
  startingView,
  viewBoxOf,
  viewportHeight,
  zoomAt,
} from './drawing-view';

/** A 300 × 200 mm sheet whose smallest label is 2.2 mm (the sizes buildDrawing uses). */
const sheet: Drawing = {
  width: 300,
  height: 200,
  scale: 5,
  paperPerUnit: 5.08,
  units: 'in',
  memberId: 'SP-1',
  title: 'SP-1',
  shapes: [
    { kind: 'text', at: [10, 10], text: 'caution', size: 2.2, anchor: 'start', role: 'caution' },
    { kind: 'text', at: [20, 20], text: 'A1', size: 2.3, anchor: 'start', role: 'hole-id' },
  ],
};

describe('the drawing viewer’s view', () => {
  it('finds the smallest label of the sheet', () => {
    expect(smallestText(sheet)).toBe(2.2);
  });

  it('starts with the whole width when the labels can be read at that size (at most 1.4 × growth)', () => {
    // 1200 px for 300 mm: 4 px/mm, the 2.2 mm label is 8.8 px and grows to 11.5 px (× 1.31).
    const view = startingView(sheet, 1200);
    expect(view).toEqual({ scale: 4, x: 0, y: 0 });
    expect(2.2 * view.scale * 1.4).toBeGreaterThanOrEqual(MIN_TEXT_PX);
    expect(viewportHeight(sheet, view, 10_000)).toBe(800);
    expect(viewportHeight(sheet, view, 600)).toBe(600);
  });

  it('starts zoomed in, centred across the sheet, on a narrow screen', () => {
    // 340 px for 300 mm would be 1.13 px/mm; the viewer starts at 11.5 / (2.2 × 1.4) px/mm instead.
    const view = startingView(sheet, 340);
    const legible = MIN_TEXT_PX / (2.2 * 1.4);
    expect(view.scale).toBeCloseTo(legible, 12);
    expect(view.x + 340 / view.scale / 2).toBeCloseTo(150, 9);
    expect(view.y).toBe(5);
  });

  it('zooms about a point that stays put on screen, within half and twelve times the fit', () => {
    const start = { scale: 4, x: 0, y: 0 };
    const zoomed = zoomAt(start, 2, 600, 400, sheet, 1200, 800);
    expect(zoomed.scale).toBe(8);
    // The sheet point under (600, 400) px was (150, 100) mm and still is.
    expect(zoomed.x + 600 / zoomed.scale).toBeCloseTo(150, 9);
    expect(zoomed.y + 400 / zoomed.scale).toBeCloseTo(100, 9);
    expect(zoomAt(start, 100, 0, 0, sheet, 1200, 800).scale).toBe(48);
    expect(zoomAt(start, 0.01, 0, 0, sheet, 1200, 800).scale).toBe(2);
  });

  it('pans with the pointer and never loses the sheet from view', () => {
    const zoomed = { scale: 8, x: 100, y: 50 };
    expect(panBy(zoomed, 80, -40, sheet, 1200, 800)).toEqual({ scale: 8, x: 90, y: 55 });
    const far = clampView({ scale: 8, x: 10_000, y: -10_000 }, sheet, 1200, 800);
    // Half a viewport (75 × 50 mm) past the sheet's far edge at most.
    expect(far).toEqual({ scale: 8, x: 300 - 150 + 75, y: -50 });
  });

  it('writes the view as an SVG viewBox in sheet mm', () => {
    expect(viewBoxOf({ scale: 4, x: 0, y: 0 }, 1200, 800)).toBe('0 0 300 200');
    expect(viewBoxOf({ scale: 3, x: 1.23456, y: 0 }, 1000, 500)).toBe('1.235 0 333.333 166.667');
  });
});
