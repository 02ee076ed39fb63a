// Shear lag factor U from AISC 360 Table D3.1 (cases 2, 7, 8) or as given, with the D3 floor.
export { shearLagCase2 } from './shearLagCase2.js';
export { shearLagCase7 } from './shearLagCase7.js';
export type { ShearLagCase7Input } from './shearLagCase7.js';
export { shearLagCase8 } from './shearLagCase8.js';
export { ShearLagError } from './shearLagError.js';
export { shearLagFactor } from './shearLagFactor.js';
export { shearLagFloor } from './shearLagFloor.js';
export type * from './types.js';
