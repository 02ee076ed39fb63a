// Block shear: outline proposals and the AISC 360 J4.3, EN 1993-1-8 3.10.2 and CSA S16 13.11 forms.
export { blockOutlines } from './blockOutlines.js';
export { blockShear, tensionFactorOf } from './blockShear.js';
export type { BlockShearCode, TensionFactorByKind } from './blockShear.js';
export { blockShearAisc } from './blockShearAisc.js';
export type { BlockShearAiscInput } from './blockShearAisc.js';
export { blockShearCsa, CSA_SHEAR_STRESS_LIMIT } from './blockShearCsa.js';
export type { BlockShearCsaInput } from './blockShearCsa.js';
export { blockShearEn } from './blockShearEn.js';
export type { BlockShearEnInput } from './blockShearEn.js';
export { BlockShearError } from './blockShearError.js';
export type * from './types.js';
export { sectionBlockLayout } from './sectionBlockLayouts.js';
