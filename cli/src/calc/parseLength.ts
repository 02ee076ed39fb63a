/** Why a length could not be read; the loader reports it under the rule of the same name. */
export type LengthProblem = 'fraction' | 'positive-length' | 'finite-number';

/** A length that cannot be read, with a message an engineer can act on. */
export class LengthError extends Error {
  override readonly name = 'LengthError';
  constructor(
    message: string,
    /** The loader's rule for this problem. */
    readonly rule: LengthProblem,
  ) {
    super(message);
  }
}

export interface ParseLengthOptions {
  /** Accept zero (coordinates). Default false: a length must be greater than zero. */
  readonly allowZero?: boolean;
  /** Accept negative values (x coordinates). Default false. */
  readonly allowNegative?: boolean;
}

// A decimal ("3", "1.5"), a fraction ("15/16") or a mixed number ("2-1/8"), optionally signed.
const LENGTH_TEXT = /^(-)?(?:(\d+(?:\.\d+)?)|(\d+)\/(\d+)|(\d+)-(\d+)\/(\d+))$/;

/**
 * Reads a length written as a number or as a string in US drafting style.
 *
 * @param value a number, or a string such as `"2-1/8"` (mixed number), `"15/16"`, `"3"` or `"1.5"`
 * @param options what else besides a positive length is acceptable
 * @returns the length as a number
 * @throws {LengthError} for empty or non-numeric text (`"NaN"`, `"Infinity"`), a zero denominator
 *   (`"1/0"`), a mixed number whose fraction is not below 1 (`"2-5/4"`), or a value out of range
 * @example
 * parseLength('2-1/8'); // 2.125
 * parseLength('15/16'); // 0.9375
 * parseLength('-3/4', { allowNegative: true }); // -0.75
 */
export function parseLength(value: number | string, options: ParseLengthOptions = {}): number {
  const shown = typeof value === 'string' ? JSON.stringify(value) : String(value);
  let result: number;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new LengthError(`${shown} is not a finite number`, 'finite-number');
    result = value;
  } else {
    const text = value.trim();
    if (text === '') throw new LengthError('an empty string is not a length', 'fraction');
    const m = LENGTH_TEXT.exec(text);
    if (!m) {
      throw new LengthError(
        `${shown} is not a length: write a number such as 1.5, or a string such as "2-1/8", "15/16" or "3"`,
        'fraction',
      );
    }
    const [, sign, decimal, num, den, whole, mixedNum, mixedDen] = m;
    if (decimal !== undefined) {
      result = Number(decimal);
    } else if (num !== undefined && den !== undefined) {
      if (Number(den) === 0) throw new LengthError(`${shown} divides by zero`, 'fraction');
      result = Number(num) / Number(den);
    } else {
      const n = Number(mixedNum);
      const d = Number(mixedDen);
      if (d === 0) throw new LengthError(`${shown} divides by zero`, 'fraction');
      if (n >= d) {
        throw new LengthError(
          `${shown}: the fraction of a mixed number must be less than 1 (write e.g. "2-1/8" or a decimal)`,
          'fraction',
        );
      }
      result = Number(whole) + n / d;
    }
    if (sign) result = -result;
  }
  if (result < 0 && !options.allowNegative) {
    throw new LengthError(
      `${shown} is negative; it must be ${options.allowZero ? 'zero or more' : 'greater than zero'}`,
      'positive-length',
    );
  }
  if (result === 0 && !options.allowZero && !options.allowNegative) {
    throw new LengthError(`${shown} must be greater than zero`, 'positive-length');
  }
  // -0 and 0 are the same coordinate.
  return result === 0 ? 0 : result;
}
