export { buildDrawing } from './model.js';
export { toSvg, slotPath, arrowHead } from './svg.js';
export { lengthLabel, netWidthLabel } from './labels.js';
export { STROKES } from './types.js';
export type * from './types.js';
