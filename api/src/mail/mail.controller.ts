import { Controller, Get, Inject, NotFoundException, Post } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { Role } from '../auth/role.enum.js';
import { appConfig } from '../config/index.js';
import { FlushResultDto, MailboxMessageDto, OutboxMessageDto } from './dto/mail.dto.js';
import { MailService, type FlushResult } from './mail.service.js';
import { MailboxMessage } from './models/mailbox-message.model.js';
import { OutboxMessage } from './models/outbox-message.model.js';

@ApiTags('mail')
@Controller('mail')
export class MailController {
  constructor(
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    @InjectModel(MailboxMessage) private readonly mailbox: typeof MailboxMessage,
    @InjectModel(OutboxMessage) private readonly outbox: typeof OutboxMessage,
    private readonly mail: MailService,
  ) {}

  @Get('mailbox')
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({
    summary:
      'Admin, demo mode only: every message the local SMTP fake received, newest first (404 otherwise). Invitation links are in these mails, so only an admin may read them.',
  })
  @ApiOkResponse({ type: [MailboxMessageDto] })
  async listMailbox(): Promise<MailboxMessageDto[]> {
    if (!this.app.demo) throw new NotFoundException('The mailbox exists only in demo mode.');
    const rows = await this.mailbox.findAll({ order: [['id', 'DESC']], limit: 200 });
    return rows.map((m) => ({
      id: m.id,
      from: m.from,
      to: m.to,
      subject: m.subject,
      text: m.text,
      receivedAt: new Date(m.receivedAt).toISOString(),
    }));
  }

  @Get('outbox')
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({ summary: 'Admin: the outbox with delivery state, newest first' })
  @ApiOkResponse({ type: [OutboxMessageDto] })
  async listOutbox(): Promise<OutboxMessageDto[]> {
    const rows = await this.outbox.findAll({ order: [['id', 'DESC']], limit: 200 });
    return rows.map((m) => ({
      id: m.id,
      kind: m.kind,
      to: m.to,
      subject: m.subject,
      status: m.status,
      attempts: m.attempts,
      lastError: m.lastError,
      nextAttemptAt: new Date(m.nextAttemptAt).toISOString(),
      sentAt: m.sentAt ? new Date(m.sentAt).toISOString() : null,
      createdAt: new Date(m.createdAt).toISOString(),
    }));
  }

  @Post('outbox/flush')
  @ApiBearerAuth()
  @Roles(Role.Admin)
  @ApiOperation({ summary: 'Admin: send every due message now instead of waiting for the worker' })
  @ApiOkResponse({ type: FlushResultDto })
  flush(): Promise<FlushResult> {
    return this.mail.flush();
  }
}
