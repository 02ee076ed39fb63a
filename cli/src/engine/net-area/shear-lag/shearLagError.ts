/**
 * The error the shear lag functions throw for a bad argument. The message starts with
 * `ligament/engine/shear-lag:`.
 *
 * @example
 * new ShearLagError('connection length must be positive, got 0').message
 * // → 'ligament/engine/shear-lag: connection length must be positive, got 0'
 */
export class ShearLagError extends Error {
  override readonly name = 'ShearLagError';

  constructor(message: string) {
    super(`ligament/engine/shear-lag: ${message}`);
  }
}
