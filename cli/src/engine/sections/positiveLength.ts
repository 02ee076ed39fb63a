import { SectionError } from './sectionError.js';

/**
 * Checks that a dimension is a finite positive number and returns it.
 *
 * @param value - the dimension
 * @param name - its name in the error message, e.g. `angle: t`
 * @returns value
 * @throws SectionError ('invalid-argument') when value is not finite and > 0
 * @example
 * positiveLength(0.625, 'angle: t') // → 0.625
 */
export function positiveLength(value: number, name: string): number {
  if (!(Number.isFinite(value) && value > 0)) {
    throw new SectionError('invalid-argument', `${name} must be a positive length, got ${value}`);
  }
  return value;
}
