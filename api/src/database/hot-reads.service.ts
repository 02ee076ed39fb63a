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

/** A cached statement and the reads running on it: an evicted one is finalised once they are done. */
interface Prepared {
  readonly statement: sqlite3.Statement;
  uses: number;
  evicted: boolean;
}

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
  /** Prepared statements by SQL text, in use order (least recent first). */
  private readonly statements = new Map<string, Prepared>();

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
    const prepared = await this.acquire(sql);
    try {
      return await new Promise<T[]>((resolve, reject) =>
        prepared.statement.all(params, (err: Error | null, rows: T[]) => (err ? reject(err) : resolve(rows))),
      );
    } finally {
      prepared.uses -= 1;
      if (prepared.evicted && prepared.uses === 0) prepared.statement.finalize();
    }
  }

  async onApplicationShutdown(): Promise<void> {
    const db = this.db;
    this.db = null;
    const idle = [...this.statements.values()];
    this.statements.clear();
    for (const p of idle) p.evicted = true;
    await Promise.all(
      idle
        .filter((p) => p.uses === 0)
        .map((p) => new Promise((resolve) => p.statement.finalize(() => resolve(null)))),
    );
    if (db && !this.inMemory) {
      const handle = await db.catch(() => null);
      if (handle) await new Promise((resolve) => handle.close(() => resolve(null)));
    }
  }

  /** The prepared statement for `sql`, counted as in use until the caller's read ends. */
  private async acquire(sql: string): Promise<Prepared> {
    let prepared = this.statements.get(sql);
    if (!prepared) {
      const db = await this.connection();
      const statement = await new Promise<sqlite3.Statement>((resolve, reject) => {
        const s: sqlite3.Statement = db.prepare(sql, (err: Error | null) => (err ? reject(err) : resolve(s)));
      });
      // Two requests may have prepared the same text at once: keep the first, finalise the other.
      prepared = this.statements.get(sql);
      if (prepared) statement.finalize();
      else prepared = { statement, uses: 0, evicted: false };
    }
    // Map order is use order: (re)insert at the back, then evict the least recently used.
    this.statements.delete(sql);
    this.statements.set(sql, prepared);
    prepared.uses += 1;
    while (this.statements.size > STATEMENT_CACHE) {
      const [oldest, victim] = this.statements.entries().next().value as [string, Prepared];
      this.statements.delete(oldest);
      victim.evicted = true;
      if (victim.uses === 0) victim.statement.finalize();
    }
    return prepared;
  }

  /** No second connection to an in-memory database: the reads share Sequelize's (never closed here). */
  private get inMemory(): boolean {
    return this.config.storage === ':memory:';
  }

  private connection(): Promise<sqlite3.Database> {
    this.db ??= this.open().catch((error: unknown) => {
      this.db = null;
      throw error;
    });
    return this.db;
  }

  private async open(): Promise<sqlite3.Database> {
    if (this.inMemory) {
      const manager = this.sequelize.connectionManager as unknown as {
        getConnection(options?: object): Promise<sqlite3.Database>;
      };
      return manager.getConnection({});
    }
    const db = await new Promise<sqlite3.Database>((resolve, reject) => {
      const handle: sqlite3.Database = new sqlite3.Database(
        this.config.storage,
        sqlite3.OPEN_READONLY | sqlite3.OPEN_URI,
        (err) => (err ? reject(err) : resolve(handle)),
      );
    });
    db.configure('busyTimeout', this.config.busyTimeoutMs);
    return db;
  }
}
