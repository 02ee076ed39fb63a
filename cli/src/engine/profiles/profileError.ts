/**
 * The error the profile functions throw for a bad argument. The message starts with
 * `ligament/engine/profiles:`.
 *
 * @example
 * new ProfileError('no EN 1090-2 clearance for an M10 bolt').message
 * // → 'ligament/engine/profiles: no EN 1090-2 clearance for an M10 bolt'
 */
export class ProfileError extends Error {
  override readonly name = 'ProfileError';

  constructor(message: string) {
    super(`ligament/engine/profiles: ${message}`);
  }
}
