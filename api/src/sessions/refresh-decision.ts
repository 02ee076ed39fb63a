/** A presented refresh token as the store knows it (times in epoch ms). */
export interface StoredRefreshToken {
  readonly expiresAt: number;
  /** When it was exchanged for its successor; null while unused. */
  readonly usedAt: number | null;
  /** Whether that successor has itself been exchanged already. */
  readonly successorUsed: boolean;
}

export interface StoredSession {
  readonly expiresAt: number;
  readonly endedAt: number | null;
}

export type RefreshDecision =
  /** Unused and live: exchange it for a new one (rotation). */
  | { readonly kind: 'rotate' }
  /**
   * Used a moment ago by a request running beside this one (two tabs share the cookie), and its
   * successor not used yet: answer a new access token but keep the cookie the other request set.
   */
  | { readonly kind: 'race' }
  /** Used before, and not such a race: someone replays an old token. End the session. */
  | { readonly kind: 'reuse' }
  /** Unknown, or its session has ended or run out: refuse; `endAs` says to end a session that ran out. */
  | { readonly kind: 'refuse'; readonly why: 'unknown' | 'ended' | 'expired'; readonly endAs?: 'expired' };

/**
 * What to do with a presented refresh token. Rotation with reuse detection (OAuth 2.0 Security BCP,
 * RFC 9700 §4.14.2): every token is used once; a used token presented again means it was copied,
 * and the whole session ends. The one exception is the race between two tabs refreshing with the same
 * cookie at once: the loser arrives after the winner used the token but before anyone used the
 * successor, within `graceMs`.
 *
 * @example
 * refreshDecision({ expiresAt: 2000, usedAt: null, successorUsed: false }, { expiresAt: 9000, endedAt: null }, 1000, 30000)
 * // → { kind: 'rotate' }
 */
export function refreshDecision(
  token: StoredRefreshToken | null,
  session: StoredSession | null,
  now: number,
  graceMs: number,
): RefreshDecision {
  if (!token || !session) return { kind: 'refuse', why: 'unknown' };
  if (session.endedAt !== null) return { kind: 'refuse', why: 'ended' };
  if (session.expiresAt <= now) return { kind: 'refuse', why: 'expired', endAs: 'expired' };
  if (token.usedAt === null) {
    return token.expiresAt <= now ? { kind: 'refuse', why: 'expired', endAs: 'expired' } : { kind: 'rotate' };
  }
  if (!token.successorUsed && now - token.usedAt <= graceMs) return { kind: 'race' };
  return { kind: 'reuse' };
}
