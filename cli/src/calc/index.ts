export { diffDocuments } from './diffDocuments.js';
export type { ChangeScope, DocumentChange } from './diffDocuments.js';
export { loadCalcText } from './loadCalcText.js';
export { parseLength, LengthError } from './parseLength.js';
export type { ParseLengthOptions, LengthProblem } from './parseLength.js';
export { CALC_SCHEMA, SCHEMA_ID, SCHEMA_VERSION } from './schema.js';
export type { JsonSchemaDocument } from './schema.js';
export type * from './types.js';
