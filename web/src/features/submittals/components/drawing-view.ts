import type { Drawing } from 'ligament/draw';

/** What part of the sheet the viewer shows: `scale` screen px per sheet mm, `x`, `y` the top-left corner in sheet mm. */
export interface View {
  readonly scale: number;
  readonly x: number;
  readonly y: number;
}

/** No label is drawn smaller than this on screen, at any zoom (issue 13: nothing under 11 px). */
export const MIN_TEXT_PX = 11.5;
/**
 * How much the viewer may enlarge the sheet's smallest label at the starting zoom. Beyond it labels
 * would crowd the plate, so a narrow screen starts zoomed in instead (and the sheet is panned).
 */
const MAX_LABEL_GROWTH = 1.4;
/** The sheet's frame sits 5 mm in and the fracture labels start about 8 mm down: skip to there. */
const TOP_MARGIN_MM = 5;
/** Zoom limits, as multiples of the scale that fits the sheet's width. */
const MIN_ZOOM = 0.5;
const MAX_ZOOM = 12;

/** The smallest label on the sheet, sheet mm. */
export function smallestText(drawing: Drawing): number {
  let least = Infinity;
  for (const s of drawing.shapes) {
    if (s.kind === 'text') least = Math.min(least, s.size);
    if (s.kind === 'dimension' || s.kind === 'fracture' || s.kind === 'claimed-chain')
      least = Math.min(least, s.label.size);
  }
  return Number.isFinite(least) ? least : 2.5;
}

/** The scale at which the sheet's width fills the viewport. */
export function fitScale(drawing: Drawing, viewportWidth: number): number {
  return viewportWidth / drawing.width;
}

/**
 * Where the viewer starts: the whole sheet's width when its labels can be read at that size (with at
 * most 1.4 × growth); otherwise zoomed in to where they can, centred on the sheet across and showing
 * the sheet's upper part (the plate; the title block is below it) from the top of the plate's labels.
 */
export function startingView(drawing: Drawing, viewportWidth: number): View {
  const fit = fitScale(drawing, viewportWidth);
  const legible = MIN_TEXT_PX / (smallestText(drawing) * MAX_LABEL_GROWTH);
  const scale = Math.max(fit, legible);
  return { scale, x: (drawing.width - viewportWidth / scale) / 2, y: scale > fit ? TOP_MARGIN_MM : 0 };
}

/** The viewport's height in px for a starting view: the sheet's height, but not more than `maxHeight`. */
export function viewportHeight(drawing: Drawing, view: View, maxHeight: number): number {
  return Math.round(Math.min(drawing.height * view.scale, maxHeight));
}

/** Keeps at least half the viewport on the sheet, so the drawing cannot be panned out of sight. */
export function clampView(view: View, drawing: Drawing, width: number, height: number): View {
  const w = width / view.scale;
  const h = height / view.scale;
  const clamp = (v: number, lo: number, hi: number) => Math.min(Math.max(v, lo), hi);
  return {
    scale: view.scale,
    x: clamp(view.x, Math.min(0, drawing.width - w) - w / 2, Math.max(0, drawing.width - w) + w / 2),
    y: clamp(view.y, Math.min(0, drawing.height - h) - h / 2, Math.max(0, drawing.height - h) + h / 2),
  };
}

/**
 * Zooms by `factor` about the point (px, py) of the viewport, which stays where it is on screen;
 * the scale stays between half and twelve times the fit.
 */
export function zoomAt(
  view: View,
  factor: number,
  px: number,
  py: number,
  drawing: Drawing,
  width: number,
  height: number,
): View {
  const fit = fitScale(drawing, width);
  const scale = Math.min(Math.max(view.scale * factor, fit * MIN_ZOOM), fit * MAX_ZOOM);
  const ux = view.x + px / view.scale;
  const uy = view.y + py / view.scale;
  return clampView({ scale, x: ux - px / scale, y: uy - py / scale }, drawing, width, height);
}

/** Moves the view by a drag of (dx, dy) screen px: the sheet follows the pointer. */
export function panBy(
  view: View,
  dx: number,
  dy: number,
  drawing: Drawing,
  width: number,
  height: number,
): View {
  return clampView(
    { ...view, x: view.x - dx / view.scale, y: view.y - dy / view.scale },
    drawing,
    width,
    height,
  );
}

/** The SVG viewBox of a view in a viewport of `width` × `height` px. */
export function viewBoxOf(view: View, width: number, height: number): string {
  const r = (v: number) => Math.round(v * 1000) / 1000;
  return `${r(view.x)} ${r(view.y)} ${r(width / view.scale)} ${r(height / view.scale)}`;
}
