import { Inject, Injectable, OnApplicationShutdown } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import sqlite3 from 'sqlite3';
import { databaseConfig } from '../config/index.js';

/** Statement values: SQLite binds numbers, strings and null. */
export type SqlValue = number | string | null;

/** How many distinct statements stay prepared; the least recently used beyond this is finalised. */
const STATEMENT_CACHE = 64;

/**
 * The few reads every request makes (who is signed in, are they on this project, the discrepancy
 * list), run as cached prepared statements on a read-only connection of their own. An ORM query
 * costs more JavaScript than these statements cost SQLite; a second connection also lets them run
 * beside a write instead of queueing behind it. In WAL mode the reader always sees every committed
 * transaction, so a request reads its own earlier writes.
 *
 * Only for plain reads with bound values; everything that writes stays with Sequelize. An in-memory
 * database has no second connection, so there the statements run on Sequelize's own.
 */
@Injectable()
export class HotReadsService implements OnApplicationShutdown {
  private db: Promise<sqlite3.Database> | null = null;
  private readonly statements = new Map<string, sqlite3.Statement>();
  private ownConnection = false;

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(databaseConfig.KEY) private readonly config: ConfigType<typeof databaseConfig>,
  ) {}

  /** The first row, or undefined. */
  async get<T>(sql: string, params: readonly SqlValue[] = []): Promise<T | undefined> {
    return (await this.all<T>(sql, params))[0];
  }

  /**
   * Every row. Always stepped to the end: a statement left on a row would hold the connection's read
   * transaction open, and every later read would see that old snapshot.
   */
  async all<T>(sql: string, params: readonly SqlValue[] = []): Promise<T[]> {
    const statement = await this.statement(sql);
    return new Promise((resolve, reject) =>
      statement.all(params, (err: Error | null, rows: T[]) => (err ? reject(err) : resolve(rows))),
    );
  }

  async onApplicationShutdown(): Promise<void> {
    const db = this.db;
    this.db = null;
    const statements = [...this.statements.values()];
    this.statements.clear();
    await Promise.all(statements.map((s) => new Promise((resolve) => s.finalize(() => resolve(null)))));
    if (db && this.ownConnection) {
      const handle = await db.catch(() => null);
      if (handle) await new Promise((resolve) => handle.close(() => resolve(null)));
    }
  }

  private async statement(sql: string): Promise<sqlite3.Statement> {
    const cached = this.statements.get(sql);
    if (cached) {
      // Map order is use order: move it to the back.
      this.statements.delete(sql);
      this.statements.set(sql, cached);
      return cached;
    }
    const db = await this.connection();
    const prepared = await new Promise<sqlite3.Statement>((resolve, reject) => {
      const s: sqlite3.Statement = db.prepare(sql, (err: Error | null) => (err ? reject(err) : resolve(s)));
    });
    // Two requests may have prepared the same text at once: keep one, finalise the other.
    const raced = this.statements.get(sql);
    if (raced) {
      prepared.finalize();
      return raced;
    }
    this.statements.set(sql, prepared);
    if (this.statements.size > STATEMENT_CACHE) {
      const [oldest, statement] = this.statements.entries().next().value as [string, sqlite3.Statement];
      this.statements.delete(oldest);
      statement.finalize();
    }
    return prepared;
  }

  private connection(): Promise<sqlite3.Database> {
    this.db ??= this.open().catch((error: unknown) => {
      this.db = null;
      throw error;
    });
    return this.db;
  }

  private async open(): Promise<sqlite3.Database> {
    if (this.config.storage === ':memory:') {
      const manager = this.sequelize.connectionManager as unknown as {
        getConnection(options?: object): Promise<sqlite3.Database>;
      };
      return manager.getConnection({});
    }
    const db = await new Promise<sqlite3.Database>((resolve, reject) => {
      const handle: sqlite3.Database = new sqlite3.Database(
        this.config.storage,
        sqlite3.OPEN_READONLY,
        (err) => (err ? reject(err) : resolve(handle)),
      );
    });
    db.configure('busyTimeout', this.config.busyTimeoutMs);
    this.ownConnection = true;
    return db;
  }
}
