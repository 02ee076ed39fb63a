// The calc-file loader's public surface: read a calc file (text) into a document or into errors that
// name the file, the JSON pointer, the line and column and the rule; the schema it validates against.
export { diffDocuments } from './diffDocuments.js';
export type { ChangeScope, DocumentChange } from './diffDocuments.js';
export { loadCalcText } from './loadCalcText.js';
export { CALC_SCHEMA, SCHEMA_ID, SCHEMA_VERSION } from './schema.js';
export type { JsonSchemaDocument } from './schema.js';
export type * from './types.js';
