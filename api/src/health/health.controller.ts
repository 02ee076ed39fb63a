import { Controller, Get, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiProperty, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ENGINE_VERSION } from 'ligament';
import { Public } from '../auth/decorators/public.decorator.js';
import { DatabaseService } from '../database/database.service.js';
import { MailService } from '../mail/mail.service.js';

class DatabaseHealthDto {
  @ApiProperty() ok: boolean;
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
}

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    private readonly database: DatabaseService,
    private readonly mail: MailService,
  ) {}

  @Get()
  @Public()
  @ApiOperation({
    summary: 'Public: database and mail status (503 when the database is down; mail trouble only degrades)',
  })
  @ApiOkResponse({ type: HealthDto })
  async health(@Res({ passthrough: true }) res: Response): Promise<HealthDto> {
    const database = await this.database.ping();
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
    return { status, engineVersion: ENGINE_VERSION, database, mail };
  }
}
