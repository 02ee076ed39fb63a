/** Shapes the calc loader's normalisation steps share (normalise.ts and the normalise*.ts beside it). */
import type { UnitSystem } from '../engine/types.js';
import type { ParseLengthOptions } from './parseLength.js';

/** A semantic problem found while normalising a schema-valid calc file. */
export interface SemanticIssue {
  readonly pointer: string;
  readonly rule: string;
  readonly message: string;
}

/** The raw, schema-valid file. Only the shapes the schema guarantees are relied on. */
export type Raw = Record<string, unknown>;

/** A length as written: a number, or in an `in` file a string such as `2-1/8`. */
export type Len = number | string;

/** How a file's numbers are read; each reader records what is wrong in `issues` and gives NaN. */
export interface CalcReaders {
  readonly units: UnitSystem;
  /** A length at a JSON pointer (fractions in `in` files, plain numbers in `mm` files). */
  readonly length: (value: Len, pointer: string, options?: ParseLengthOptions) => number;
  /** A bolt size at a JSON pointer: a diameter, or a metric size such as `M20` in a `mm` file. */
  readonly bolt: (value: Len, pointer: string) => number;
  readonly issues: SemanticIssue[];
}
