import type { components } from './api-types';

/** A response or request body type from the API's OpenAPI document, by schema name. */
export type Schema<Name extends keyof components['schemas']> = components['schemas'][Name];
