export { formatText, findingLine, errorLine, NO_PAINT } from './text.js';
export type { Paint, TextOptions } from './text.js';
export { formatJson, resultDocument, RESULT_SCHEMA_ID, RESULT_FORMAT_VERSION } from './json.js';
export type { ResultDocument } from './json.js';
export { formatJunit, JUNIT_CHECKS } from './junit.js';
export { formatSarif, SARIF_SCHEMA_URI } from './sarif.js';
export type { RuleInfo, SarifOptions } from './sarif.js';
export { formatMarkdown } from './markdown.js';
