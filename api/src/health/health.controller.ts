import { Controller, Get, Inject, Res } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { ApiOkResponse, ApiOperation, ApiProperty, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ENGINE_VERSION } from 'ligament';
import { Public } from '../auth/decorators/public.decorator.js';
import { appConfig, authConfig, configWarnings } from '../config/index.js';
import { DatabaseService } from '../database/database.service.js';
import { MailService } from '../mail/mail.service.js';

class DatabaseHealthDto {
  @ApiProperty({ description: 'Readable and writable' }) ok: boolean;
  @ApiProperty({ description: 'The last write (a request’s or the heartbeat’s) committed' })
  writable: boolean;
  @ApiProperty({ required: false }) error?: string;
}

class MailHealthDto {
  @ApiProperty({ description: 'Fake running (if used) and no message failing' }) ok: boolean;
  @ApiProperty({ example: 'smtp://127.0.0.1:2525' }) transport: string;
  @ApiProperty() fake: boolean;
  @ApiProperty() fakeRunning: boolean;
  @ApiProperty() pending: number;
  @ApiProperty({ nullable: true, type: String }) oldestPendingAt: string | null;
  @ApiProperty({ nullable: true, type: String }) lastError: string | null;
}

class HealthDto {
  @ApiProperty({ enum: ['ok', 'degraded', 'down'] }) status: 'ok' | 'degraded' | 'down';
  @ApiProperty() engineVersion: string;
  @ApiProperty({ type: DatabaseHealthDto }) database: DatabaseHealthDto;
  @ApiProperty({ type: MailHealthDto }) mail: MailHealthDto;
  @ApiProperty({ description: 'Demo mode: seeded data, demo mailbox (admin), demo sign-ins' }) demo: boolean;
  @ApiProperty({ type: [String], description: 'Unsafe settings, e.g. the public demo JWT secret' })
  warnings: string[];
}

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    private readonly database: DatabaseService,
    private readonly mail: MailService,
    @Inject(authConfig.KEY) private readonly auth: ConfigType<typeof authConfig>,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  @Get()
  @Public()
  @ApiOperation({
    summary:
      'Public: database and mail status (503 when the database cannot be read or written; mail trouble only degrades)',
  })
  @ApiOkResponse({ type: HealthDto })
  async health(@Res({ passthrough: true }) res: Response): Promise<HealthDto> {
    const database = await this.database.health();
    const mail = database.ok
      ? await this.mail.health()
      : {
          ok: false,
          transport: '',
          fake: false,
          fakeRunning: false,
          pending: 0,
          oldestPendingAt: null,
          lastError: 'database down',
        };
    const status = !database.ok ? 'down' : mail.ok ? 'ok' : 'degraded';
    if (status === 'down') res.status(503);
    const warnings = configWarnings(this.auth);
    return { status, engineVersion: ENGINE_VERSION, database, mail, demo: this.app.demo, warnings };
  }
}
