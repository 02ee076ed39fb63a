/** What kind of bad argument an {@link EngineError} reports. */
export type EngineErrorCode =
  | 'unknown-bolt-size'
  | 'missing-bolt-size'
  | 'missing-slot-orientation'
  | 'invalid-argument'
  | 'not-a-chain'
  | 'too-many-chains';

/**
 * The one error the engine throws: a bad argument from a caller that skipped the loader's checks.
 * The message starts with `ligament/engine:` and names the offending value.
 *
 * @example
 * new EngineError('unknown-bolt-size', 'no AISC 360-22 hole for a 0.8 in bolt').message
 * // → 'ligament/engine: no AISC 360-22 hole for a 0.8 in bolt'
 */
export class EngineError extends Error {
  override readonly name = 'EngineError';
  readonly code: EngineErrorCode;

  constructor(code: EngineErrorCode, message: string) {
    super(`ligament/engine: ${message}`);
    this.code = code;
  }
}
