/** What kind of bad argument a {@link SectionError} reports. */
export type SectionErrorCode =
  'invalid-argument' | 'unknown-element' | 'hole-outside-element' | 'too-many-chains' | 'not-a-chain';

/**
 * The error the section functions throw for a bad argument (a caller that skipped the loader's
 * checks). The message starts with `ligament/engine/sections:`.
 *
 * @example
 * new SectionError('unknown-element', 'no element "web" in L6x6x5/8').message
 * // → 'ligament/engine/sections: no element "web" in L6x6x5/8'
 */
export class SectionError extends Error {
  override readonly name = 'SectionError';
  readonly code: SectionErrorCode;

  constructor(code: SectionErrorCode, message: string) {
    super(`ligament/engine/sections: ${message}`);
    this.code = code;
  }
}
