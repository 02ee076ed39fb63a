/**
 * SQLite result codes that mean the storage itself failed (not the statement): the database cannot
 * be written now. Answered 503; the cause goes to the log.
 */
const UNAVAILABLE = new Set([
  'SQLITE_READONLY',
  'SQLITE_FULL',
  'SQLITE_BUSY',
  'SQLITE_LOCKED',
  'SQLITE_IOERR',
  'SQLITE_CORRUPT',
  'SQLITE_NOTADB',
  'SQLITE_CANTOPEN',
  'SQLITE_PERM',
  'SQLITE_PROTOCOL',
]);

/**
 * Codes after which this process should not go on: the file is damaged, gone or unreadable, and every
 * later request would fail the same way. The process exits non-zero so a supervisor restarts it (and
 * start-up then reports the cause). A read-only file, a full disk or a lock held by another process
 * may clear up, so they only answer 503 and turn health down.
 */
const UNRECOVERABLE = new Set(['SQLITE_CORRUPT', 'SQLITE_NOTADB', 'SQLITE_IOERR', 'SQLITE_CANTOPEN']);

/** The SQLite code of an error from sqlite3, or of the error Sequelize wrapped around it. */
export function sqliteCode(error: unknown): string | null {
  for (let e: unknown = error, depth = 0; e && typeof e === 'object' && depth < 4; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && code.startsWith('SQLITE_')) return code;
    const inner = e as { parent?: unknown; original?: unknown };
    e = inner.parent ?? inner.original;
  }
  const message = error instanceof Error ? error.message : '';
  return /^(SQLITE_[A-Z_]+):/.exec(message)?.[1] ?? null;
}

export interface StorageFault {
  readonly code: string;
  readonly message: string;
  readonly unrecoverable: boolean;
}

/** What the error says about the storage, or null when it is an error of the statement or the caller. */
export function storageFault(error: unknown): StorageFault | null {
  const code = sqliteCode(error);
  if (!code || !UNAVAILABLE.has(code)) return null;
  const message = error instanceof Error ? error.message : String(error);
  return { code, message, unrecoverable: UNRECOVERABLE.has(code) };
}
