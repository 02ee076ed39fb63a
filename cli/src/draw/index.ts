// The drawing model's public surface: a member and its result as plain shapes in paper millimetres,
// one stroke table, and the SVG serialiser with the slot and arrow-head geometry any other renderer
// (the web app's) draws the same shapes with.
export { buildDrawing } from './model.js';
export { chainPoints, withClaimedChain } from './claimedChain.js';
export type { ClaimedChainInput } from './claimedChain.js';
export { toSvg, slotPath, arrowHead } from './svg.js';
export { STROKES } from './types.js';
export type * from './types.js';
