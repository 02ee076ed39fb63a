import { Global, Module } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { SequelizeModule } from '@nestjs/sequelize';
import { Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { databaseConfig } from '../config/index.js';
import { DatabaseService } from './database.service.js';
import { HotReadsService } from './hot-reads.service.js';
import { MODELS } from './models.js';

/** Global, like the Sequelize connection it opens: every module may read through HotReadsService. */
@Global()
@Module({
  imports: [
    SequelizeModule.forRootAsync({
      inject: [databaseConfig.KEY],
      useFactory: (config: ConfigType<typeof databaseConfig>) => ({
        dialect: 'sqlite' as const,
        storage: config.storage,
        models: MODELS,
        autoLoadModels: false,
        synchronize: false,
        logging: false,
        // A `file:` URI (e.g. `?mode=ro`) is opened as SQLite reads it; a plain path is created if missing.
        dialectOptions: {
          mode: config.storage.startsWith('file:')
            ? sqlite3.OPEN_READWRITE | sqlite3.OPEN_URI
            : sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE,
        },
        // BEGIN IMMEDIATE: a writing transaction takes the write lock up front, so two never deadlock upgrading.
        transactionType: Transaction.TYPES.IMMEDIATE,
      }),
    }),
  ],
  providers: [DatabaseService, HotReadsService],
  exports: [DatabaseService, HotReadsService],
})
export class DatabaseModule {}
