/**
 * The calc-file JSON Schema, bundled with the package. `cli/schema/` is a copy of the repository's
 * `schema/` folder made by `npm run copy-schema` (run by build, test and typecheck), so the schema the
 * loader validates against is byte for byte the one published beside the format.
 */
import schema from '../../schema/calc.schema.json' with { type: 'json' };

/** A JSON Schema document, read-only. */
export interface JsonSchemaDocument {
  readonly $id: string;
  readonly [keyword: string]: unknown;
}

/** The calc file schema (JSON Schema 2020-12). */
export const CALC_SCHEMA: JsonSchemaDocument = schema;

/** `$id` of the calc file schema; also the value a calc file may give in `"$schema"`. */
export const SCHEMA_ID = 'urn:ligament:schema:calc:1.0';

/** Calc file format version this loader reads (`formatVersion`). */
export const SCHEMA_VERSION = '1.0';

if (CALC_SCHEMA.$id !== SCHEMA_ID) {
  throw new Error(`calc: bundled schema has $id ${CALC_SCHEMA.$id}, expected ${SCHEMA_ID}`);
}
