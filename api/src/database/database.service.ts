import { Inject, Injectable, Logger, OnModuleInit } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { SequelizeStorage, Umzug } from 'umzug';
import { databaseConfig } from '../config/index.js';
import { migrations } from './migrations/index.js';

interface SqliteConnection {
  configure(option: 'busyTimeout', value: number): void;
  run(sql: string): void;
}

/**
 * Opens the SQLite database the way the service needs it: every connection (Sequelize opens one per
 * transaction on a file database) gets the busy timeout and foreign keys; the file is put in WAL
 * mode; then umzug applies pending migrations. No `sync()` anywhere.
 */
@Injectable()
export class DatabaseService implements OnModuleInit {
  private readonly logger = new Logger(DatabaseService.name);

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(databaseConfig.KEY) private readonly config: ConfigType<typeof databaseConfig>,
  ) {}

  async onModuleInit(): Promise<void> {
    this.configureConnections();
    if (this.config.storage !== ':memory:') {
      await this.sequelize.query('PRAGMA journal_mode=WAL');
      await this.sequelize.query('PRAGMA synchronous=NORMAL');
    }
    const applied = await this.migrate();
    if (applied.length > 0) this.logger.log(`Applied migrations: ${applied.join(', ')}`);
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

  /** Database reachability for /api/health. */
  async ping(): Promise<{ ok: boolean; error?: string }> {
    try {
      await this.sequelize.query('SELECT 1');
      return { ok: true };
    } catch (error) {
      return { ok: false, error: error instanceof Error ? error.message : String(error) };
    }
  }

  private configureConnections(): void {
    const manager = this.sequelize.connectionManager as unknown as {
      getConnection(options?: unknown): Promise<SqliteConnection>;
    };
    const original = manager.getConnection.bind(manager);
    const configured = new WeakSet<SqliteConnection>();
    const busyTimeout = this.config.busyTimeoutMs;
    manager.getConnection = async (options?: unknown) => {
      const connection = await original(options);
      if (!configured.has(connection)) {
        connection.configure('busyTimeout', busyTimeout);
        configured.add(connection);
      }
      return connection;
    };
  }
}
