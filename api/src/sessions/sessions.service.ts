import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { randomSecret, sha256Hex } from '../common/hash.js';
import { authConfig } from '../config/index.js';
import { EventsService } from '../events/events.service.js';
import { RefreshToken } from './models/refresh-token.model.js';
import { Session, type SessionEndReason } from './models/session.model.js';
import { refreshDecision } from './refresh-decision.js';

export const REFRESH_TOKEN_PREFIX = 'lgr_';
const HOUR_MS = 3600_000;

/** A session and the refresh token to put in its cookie (null: keep the cookie the browser has). */
export interface SessionGrant {
  readonly sessionId: number;
  readonly userId: number;
  readonly refreshToken: string | null;
  /** How long the cookie should live: the refresh token's own lifetime. */
  readonly cookieMaxAgeMs: number;
}

type RefreshOutcome = { refused: keyof typeof REFUSALS } | { grant: SessionGrant };

const time = (d: Date | string | null): number | null => (d === null ? null : new Date(d).getTime());

/**
 * Browser sessions: a refresh token in an httpOnly cookie, stored here as sha256, rotated on every use
 * with reuse detection (a used token presented again ends the session), and a session id that every
 * access token names so that ending a session takes effect on the next request.
 */
@Injectable()
export class SessionsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Session) private readonly sessions: typeof Session,
    @InjectModel(RefreshToken) private readonly tokens: typeof RefreshToken,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
    private readonly events: EventsService,
  ) {}

  /** A new session for a user who has just signed in, with its first refresh token. */
  async start(userId: number, userAgent: string | undefined): Promise<SessionGrant> {
    const now = Date.now();
    return this.sequelize.transaction(async (transaction) => {
      // Ended or lapsed sessions are kept a while for reuse detection and the record, then dropped.
      await this.sessions.destroy({
        where: { userId, expiresAt: { [Op.lt]: new Date(now - 7 * 24 * HOUR_MS) } },
        transaction,
      });
      const session = await this.sessions.create(
        {
          userId,
          userAgent: userAgent?.slice(0, 300) ?? null,
          expiresAt: new Date(now + this.config.sessionMaxDays * 24 * HOUR_MS),
        },
        { transaction },
      );
      return this.issue(session, now, transaction);
    });
  }

  /**
   * Exchanges a refresh token for a new one. Refuses (401) an unknown, used or lapsed token; a used
   * one that is not a tab's race also ends its session and records `session.refresh-reused`.
   */
  async refresh(presented: string | undefined): Promise<SessionGrant> {
    if (!presented) throw new UnauthorizedException('No session in this browser: sign in.');
    const outcome = await this.sequelize.transaction(async (transaction): Promise<RefreshOutcome> => {
      const now = Date.now();
      const token = await this.tokens.findOne({ where: { tokenHash: sha256Hex(presented) }, transaction });
      const session = token ? await this.sessions.findByPk(token.sessionId, { transaction }) : null;
      const successor = token?.replacedById
        ? await this.tokens.findByPk(token.replacedById, { attributes: ['usedAt'], transaction })
        : null;
      const decision = refreshDecision(
        token && {
          expiresAt: time(token.expiresAt) ?? 0,
          usedAt: time(token.usedAt),
          successorUsed: Boolean(successor?.usedAt),
        },
        session && { expiresAt: time(session.expiresAt) ?? 0, endedAt: time(session.endedAt) },
        now,
        this.config.refreshRaceGraceSeconds * 1000,
      );
      if (!token || !session || decision.kind === 'refuse') {
        if (session && decision.kind === 'refuse' && decision.endAs)
          await this.endSession(session, decision.endAs, transaction);
        return { refused: decision.kind === 'refuse' ? decision.why : 'unknown' };
      }
      if (decision.kind === 'reuse') {
        await this.endSession(session, 'refresh-reused', transaction);
        await this.events.record(
          {
            type: 'session.refresh-reused',
            actorId: session.userId,
            data: { sessionId: session.id, userAgent: session.userAgent },
          },
          transaction,
        );
        return { refused: 'reused' };
      }
      if (decision.kind === 'race') {
        return {
          grant: {
            sessionId: session.id,
            userId: session.userId,
            refreshToken: null,
            cookieMaxAgeMs: Math.max(0, (time(token.expiresAt) ?? now) - now),
          },
        };
      }
      const grant = await this.issue(session, now, transaction);
      const [moved] = await this.tokens.update(
        { usedAt: new Date(now), replacedById: grant.tokenId },
        { where: { id: token.id, usedAt: null }, transaction },
      );
      // Transactions run one at a time, so nobody can have used the token since it was read.
      if (moved !== 1) throw new Error(`refresh token ${token.id} was used while its exchange ran`);
      await session.update({ lastRefreshedAt: new Date(now) }, { transaction });
      return { grant };
    });
    if ('refused' in outcome) throw new UnauthorizedException(REFUSALS[outcome.refused]);
    return outcome.grant;
  }

  /** Ends the session a refresh token (current or already used) belongs to; nothing when unknown. */
  async endByToken(presented: string | undefined): Promise<void> {
    if (!presented) return;
    await this.sequelize.transaction(async (transaction) => {
      const token = await this.tokens.findOne({ where: { tokenHash: sha256Hex(presented) }, transaction });
      const session = token ? await this.sessions.findByPk(token.sessionId, { transaction }) : null;
      if (session && !session.endedAt) await this.endSession(session, 'signed-out', transaction);
    });
  }

  /** Ends every live session of a user (deactivation); answers how many. */
  async endAllForUser(userId: number, reason: SessionEndReason, transaction?: Transaction): Promise<number> {
    const [ended] = await this.sessions.update(
      { endedAt: new Date(), endReason: reason },
      { where: { userId, endedAt: null }, transaction },
    );
    return ended;
  }

  private async endSession(session: Session, reason: SessionEndReason, transaction: Transaction) {
    await session.update({ endedAt: new Date(), endReason: reason }, { transaction });
  }

  /** A new refresh token for the session, lapsing after the idle time or at the session's end. */
  private async issue(
    session: Session,
    now: number,
    transaction: Transaction,
  ): Promise<SessionGrant & { tokenId: number; refreshToken: string }> {
    const refreshToken = randomSecret(REFRESH_TOKEN_PREFIX, 32);
    const expiresAt = Math.min(now + this.config.sessionIdleHours * HOUR_MS, time(session.expiresAt) ?? now);
    const row = await this.tokens.create(
      { sessionId: session.id, tokenHash: sha256Hex(refreshToken), expiresAt: new Date(expiresAt) },
      { transaction },
    );
    return {
      sessionId: session.id,
      userId: session.userId,
      refreshToken,
      tokenId: row.id,
      cookieMaxAgeMs: expiresAt - now,
    };
  }
}

const REFUSALS: Record<'unknown' | 'ended' | 'expired' | 'reused', string> = {
  unknown: 'This browser’s session is not known: sign in.',
  ended: 'This session has ended (signed out elsewhere, or ended by an admin): sign in again.',
  expired: 'This session has run out: sign in again.',
  reused: 'This session was ended because an old sign-in token was used again; sign in again.',
};
