export { buildDrawing } from './model.js';
export { chainPoints, withClaimedChain } from './claimedChain.js';
export type { ClaimedChainInput } from './claimedChain.js';
export type { DrawOptions } from './model.js';
export { toSvg, slotPath, arrowHead } from './svg.js';
export { lengthLabel, netWidthLabel } from './labels.js';
export { STROKES } from './types.js';
export type * from './types.js';
