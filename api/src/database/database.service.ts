import {
  BeforeApplicationShutdown,
  Inject,
  Injectable,
  Logger,
  OnModuleInit,
  ServiceUnavailableException,
} from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes, type Transaction, type TransactionOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { SequelizeStorage, Umzug } from 'umzug';
import { databaseConfig } from '../config/index.js';
import { migrations } from './migrations/index.js';
import { storageFault, type StorageFault } from './storage-errors.js';
import { WriteQueue } from './write-queue.js';

interface SqliteConnection {
  configure(option: 'busyTimeout', value: number): void;
  run(sql: string, callback?: (err: Error | null) => void): void;
}

interface ConnectionManager {
  connections: Record<string, SqliteConnection>;
  getConnection(options?: { uuid?: string }): Promise<SqliteConnection>;
  releaseConnection(connection: SqliteConnection, force?: boolean): void;
}

type TransactionFn = (t: Transaction) => Promise<unknown>;
type SequelizeTransaction = (options?: TransactionOptions | TransactionFn, fn?: TransactionFn) => unknown;
type SequelizeQuery = (
  sql: unknown,
  options?: { transaction?: Transaction | null; type?: string },
) => unknown;

/** The key of the one write connection in Sequelize's connection map. */
const WRITER = 'writer';
/** Query types that change the database; raw SQL is judged by its first word. */
const WRITE_TYPES = new Set<string>([
  QueryTypes.INSERT,
  QueryTypes.UPDATE,
  QueryTypes.BULKUPDATE,
  QueryTypes.BULKDELETE,
  QueryTypes.DELETE,
  QueryTypes.UPSERT,
]);
const WRITE_SQL = /^\s*(INSERT|UPDATE|DELETE|REPLACE|CREATE|DROP|ALTER)\b/i;
/** A write result younger than this answers health's "can it write?" without a new heartbeat. */
const WRITE_STATE_FRESH_MS = 5000;
/** Health waits this long for its heartbeat behind queued writes, then reports the last outcome. */
const HEARTBEAT_WAIT_MS = 250;

export interface DatabaseHealth {
  ok: boolean;
  /** The last write (a request's or the heartbeat's) committed. */
  writable: boolean;
  error?: string;
}

function isWrite(sql: unknown, type: string | undefined): boolean {
  if (type && WRITE_TYPES.has(type)) return true;
  const text = typeof sql === 'string' ? sql : (sql as { query?: unknown } | null)?.query;
  return typeof text === 'string' && WRITE_SQL.test(text);
}

/**
 * Opens the SQLite database the way the service needs it and owns every write to it.
 *
 * - ONE write connection: every transaction runs on it (Sequelize would open a connection per
 *   transaction), and a queue in front of it runs one transaction at a time, each opened with
 *   BEGIN IMMEDIATE. Writes outside a transaction are put into one on the same queue. So no writer
 *   ever waits on SQLite's lock, and no libuv thread sleeps through the busy timeout (which now only
 *   matters against another process).
 * - Reads outside a transaction stay on Sequelize's default connection, and the hottest ones on
 *   HotReadsService's read-only connection; in WAL mode neither waits for the writer.
 * - A write that fails because of the storage (read-only file, full disk, damaged file) is logged
 *   with its cause and answered 503, turns health down, and for a damaged or vanished file tells the
 *   process to stop (main.ts exits non-zero).
 *
 * umzug applies pending migrations at start; no `sync()` anywhere.
 */
@Injectable()
export class DatabaseService implements OnModuleInit, BeforeApplicationShutdown {
  private readonly logger = new Logger(DatabaseService.name);
  private readonly queue = new WriteQueue();
  private lastWrite: { ok: boolean; at: number; error?: string } | null = null;
  private heartbeat: Promise<void> | null = null;
  private readonly unrecoverableListeners: ((fault: StorageFault) => void)[] = [];
  private unrecoverable: StorageFault | null = null;

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(databaseConfig.KEY) private readonly config: ConfigType<typeof databaseConfig>,
  ) {}

  async onModuleInit(): Promise<void> {
    this.installWriter();
    if (!this.inMemory) {
      await this.sequelize.query('PRAGMA journal_mode=WAL');
      await this.sequelize.query('PRAGMA synchronous=NORMAL');
    }
    const applied = await this.migrate();
    if (applied.length > 0) this.logger.log(`Applied migrations: ${applied.join(', ')}`);
  }

  /** Lets the writes queued before shutdown finish before the connections close. */
  async beforeApplicationShutdown(): Promise<void> {
    await this.queue.drained();
  }

  /** Applies pending migrations; returns their names. */
  async migrate(): Promise<string[]> {
    const umzug = new Umzug({
      migrations,
      context: this.sequelize,
      storage: new SequelizeStorage({ sequelize: this.sequelize, tableName: 'migrations' }),
      logger: undefined,
    });
    const done = await umzug.up();
    return done.map((m) => m.name);
  }

  /** Transactions and writes waiting for, or holding, the write connection. */
  get queuedWrites(): number {
    return this.queue.depth;
  }

  /** Called once with the fault when the storage fails in a way the process cannot recover from. */
  onUnrecoverable(listener: (fault: StorageFault) => void): void {
    this.unrecoverableListeners.push(listener);
    if (this.unrecoverable) listener(this.unrecoverable);
  }

  /**
   * For /api/health: can the database be read (a read of the file, not `SELECT 1`), and can it be
   * written (the last write's outcome if recent, else a heartbeat row rewritten through the queue).
   */
  async health(): Promise<DatabaseHealth> {
    try {
      await this.sequelize.query('SELECT count(*) FROM migrations', { type: QueryTypes.SELECT });
    } catch (error) {
      return { ok: false, writable: false, error: error instanceof Error ? error.message : String(error) };
    }
    const last = this.lastWrite;
    if (!last || Date.now() - last.at > WRITE_STATE_FRESH_MS) {
      this.heartbeat ??= this.beat().finally(() => {
        this.heartbeat = null;
      });
      let timer: NodeJS.Timeout | undefined;
      await Promise.race([
        this.heartbeat,
        new Promise((resolve) => {
          timer = setTimeout(resolve, HEARTBEAT_WAIT_MS);
        }),
      ]);
      clearTimeout(timer);
    }
    const now = this.lastWrite;
    if (now && !now.ok) return { ok: false, writable: false, error: now.error };
    return { ok: true, writable: true };
  }

  /** Rewrites the heartbeat row; the outcome is recorded like any write's. */
  private async beat(): Promise<void> {
    await this.sequelize
      .query(
        'INSERT INTO storage_heartbeat (id, at) VALUES (1, ?) ON CONFLICT (id) DO UPDATE SET at = excluded.at',
        {
          replacements: [new Date().toISOString()],
        },
      )
      .catch(() => undefined);
  }

  private get inMemory(): boolean {
    return this.config.storage === ':memory:';
  }

  /**
   * Points every transaction at the one write connection, queues transactions and writes, and
   * configures each connection once (busy timeout, and synchronous=NORMAL on the writer: WAL keeps
   * that durable against a process crash).
   */
  private installWriter(): void {
    const manager = this.sequelize.connectionManager as unknown as ConnectionManager;
    const getConnection = manager.getConnection.bind(manager);
    const releaseConnection = manager.releaseConnection.bind(manager);
    const configured = new WeakSet<SqliteConnection>();
    const busyTimeout = this.config.busyTimeoutMs;
    const inMemory = this.inMemory;
    manager.getConnection = async (options = {}) => {
      const forTransaction = !inMemory && options.uuid !== undefined && options.uuid !== 'default';
      const connection = await getConnection(forTransaction ? { ...options, uuid: WRITER } : options);
      if (!configured.has(connection)) {
        configured.add(connection);
        connection.configure('busyTimeout', busyTimeout);
        if (forTransaction) connection.run('PRAGMA synchronous=NORMAL');
      }
      return connection;
    };
    manager.releaseConnection = (connection, force) => {
      // The writer outlives its transactions; Sequelize closes it with the others at shutdown.
      if (connection === manager.connections[WRITER]) return;
      releaseConnection(connection, force);
    };

    const sequelize = this.sequelize as unknown as {
      transaction: SequelizeTransaction;
      query: SequelizeQuery;
    };
    const transaction = sequelize.transaction.bind(this.sequelize) as SequelizeTransaction;
    const query = sequelize.query.bind(this.sequelize) as SequelizeQuery;
    sequelize.transaction = (optionsOrFn, maybeFn) => {
      const fn = typeof optionsOrFn === 'function' ? optionsOrFn : maybeFn;
      if (!fn) {
        // An unmanaged transaction could not be queued: it would share the writer with a running one.
        throw new Error('DatabaseService: use a managed transaction, sequelize.transaction(async (t) => …)');
      }
      const options = typeof optionsOrFn === 'function' ? {} : (optionsOrFn ?? {});
      return this.write(() => transaction(options, fn) as Promise<unknown>);
    };
    sequelize.query = (sql, options) => {
      if (options?.transaction || !isWrite(sql, options?.type)) return query(sql, options);
      return this.write(
        () =>
          transaction(
            {},
            (t: Transaction) => query(sql, { ...options, transaction: t }) as Promise<unknown>,
          ) as Promise<unknown>,
      );
    };
  }

  /** Runs a write on the queue; records its outcome and turns storage failures into 503. */
  private write<T>(job: () => Promise<T>): Promise<T> {
    // Inside a queued write already: the outer write records the outcome and resets the writer.
    if (this.queue.insideJob) return job().catch((error: unknown) => Promise.reject(this.failure(error)));
    return this.queue.run(async () => {
      try {
        const result = await job();
        this.lastWrite = { ok: true, at: Date.now() };
        return result;
      } catch (error) {
        await this.resetWriter();
        throw this.failure(error);
      }
    });
  }

  /**
   * After a failed write the writer must be out of any transaction, or every later BEGIN would fail
   * ("cannot start a transaction within a transaction"): a COMMIT that failed leaves it open.
   */
  private async resetWriter(): Promise<void> {
    const manager = this.sequelize.connectionManager as unknown as ConnectionManager;
    const writer = manager.connections[this.inMemory ? 1 : WRITER];
    if (!writer) return;
    await new Promise<void>((resolve) => writer.run('ROLLBACK', () => resolve()));
  }

  private failure(error: unknown): unknown {
    const fault = storageFault(error);
    if (!fault) return error;
    this.lastWrite = { ok: false, at: Date.now(), error: fault.message };
    this.logger.error(`Write failed, nothing was stored: ${fault.message}`);
    if (fault.unrecoverable && !this.unrecoverable) {
      this.unrecoverable = fault;
      this.logger.error(`The database cannot be used any more (${fault.code}); the service stops.`);
      for (const listener of this.unrecoverableListeners) listener(fault);
    }
    return new ServiceUnavailableException(
      `The database cannot be written (${fault.message}); nothing was stored. Try again later.`,
    );
  }
}
