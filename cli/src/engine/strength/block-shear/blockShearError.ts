/**
 * The error the block shear functions throw for a bad argument. The message starts with
 * `ligament/engine/block-shear:`.
 *
 * @example
 * new BlockShearError('thickness must be positive').message
 * // → 'ligament/engine/block-shear: thickness must be positive'
 */
export class BlockShearError extends Error {
  override readonly name = 'BlockShearError';

  constructor(message: string) {
    super(`ligament/engine/block-shear: ${message}`);
  }
}
