import { sqliteCode, storageFault } from './storage-errors.js';

describe('storage faults', () => {
  const sqlite = (code: string, message: string) => Object.assign(new Error(`${code}: ${message}`), { code });

  it('finds the SQLite code on the error or on the error Sequelize wrapped around it', () => {
    const readonly = sqlite('SQLITE_READONLY', 'attempt to write a readonly database');
    expect(sqliteCode(readonly)).toBe('SQLITE_READONLY');
    expect(sqliteCode(Object.assign(new Error('wrapped'), { parent: readonly }))).toBe('SQLITE_READONLY');
    expect(sqliteCode(new Error('SQLITE_FULL: database or disk is full'))).toBe('SQLITE_FULL');
    expect(sqliteCode(new Error('plain'))).toBeNull();
  });

  it('a read-only file or a full disk is unavailable for now; a damaged file is unrecoverable', () => {
    expect(storageFault(sqlite('SQLITE_READONLY', 'attempt to write a readonly database'))).toMatchObject({
      code: 'SQLITE_READONLY',
      unrecoverable: false,
    });
    expect(storageFault(sqlite('SQLITE_FULL', 'database or disk is full'))?.unrecoverable).toBe(false);
    expect(storageFault(sqlite('SQLITE_CORRUPT', 'database disk image is malformed'))?.unrecoverable).toBe(
      true,
    );
    expect(storageFault(sqlite('SQLITE_IOERR', 'disk I/O error'))?.unrecoverable).toBe(true);
  });

  it('a constraint or a syntax error is the statement’s fault, not the storage’s', () => {
    expect(storageFault(sqlite('SQLITE_CONSTRAINT', 'UNIQUE constraint failed: users.email'))).toBeNull();
    expect(storageFault(sqlite('SQLITE_ERROR', 'no such table: nope'))).toBeNull();
  });
});
