import type { Sequelize } from 'sequelize';

/**
 * - `sessions`: one row per sign-in in a browser. The short-lived access JWT names its session
 *   (`sid`), and every request checks the session has not ended, so signing out, a detected reuse
 *   of a refresh token or an admin deactivating the user ends it at once.
 * - `refresh_tokens`: the session's refresh tokens, stored as sha256 only. Each is used once and
 *   replaced (`replacedById`); presenting a used one after its successor has been used ends the
 *   whole session (reuse detection).
 * - invitations may be revoked, or replaced by a resent one (a new link; the old one is dead).
 */
const up = [
  `CREATE TABLE sessions (
    id INTEGER PRIMARY KEY AUTOINCREMENT,
    userId INTEGER NOT NULL REFERENCES users(id) ON DELETE CASCADE,
    userAgent TEXT,
    expiresAt DATETIME NOT NULL,
    lastRefreshedAt DATETIME,
    endedAt DATETIME,
    endReason TEXT CHECK (endReason IN ('signed-out','refresh-reused','deactivated','expired')),
    createdAt DATETIME NOT NULL)`,
  'CREATE INDEX sessions_user_live ON sessions(userId) WHERE endedAt IS NULL',
  `CREATE TABLE refresh_tokens (
    id INTEGER PRIMARY KEY AUTOINCREMENT,
    sessionId INTEGER NOT NULL REFERENCES sessions(id) ON DELETE CASCADE,
    tokenHash TEXT NOT NULL UNIQUE,
    expiresAt DATETIME NOT NULL,
    usedAt DATETIME,
    replacedById INTEGER REFERENCES refresh_tokens(id),
    createdAt DATETIME NOT NULL)`,
  'CREATE INDEX refresh_tokens_session ON refresh_tokens(sessionId)',
  'ALTER TABLE invitations ADD COLUMN revokedAt DATETIME',
  'ALTER TABLE invitations ADD COLUMN revokedById INTEGER REFERENCES users(id)',
  'ALTER TABLE invitations ADD COLUMN replacedById INTEGER REFERENCES invitations(id)',
];
const down = [
  'ALTER TABLE invitations DROP COLUMN replacedById',
  'ALTER TABLE invitations DROP COLUMN revokedById',
  'ALTER TABLE invitations DROP COLUMN revokedAt',
  'DROP TABLE refresh_tokens',
  'DROP TABLE sessions',
];

export const sessionsAndInvitationRevocation = {
  name: '0006-sessions-and-invitation-revocation',
  async up({ context }: { context: Sequelize }): Promise<void> {
    await context.transaction(async (transaction) => {
      for (const sql of up) await context.query(sql, { transaction });
    });
  },
  async down({ context }: { context: Sequelize }): Promise<void> {
    await context.transaction(async (transaction) => {
      for (const sql of down) await context.query(sql, { transaction });
    });
  },
};
