import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailController } from './mail.controller.js';
import { MailService } from './mail.service.js';
import { MailboxMessage } from './models/mailbox-message.model.js';
import { OutboxMessage } from './models/outbox-message.model.js';
import { SmtpFakeService } from './smtp-fake.service.js';

@Module({
  imports: [SequelizeModule.forFeature([OutboxMessage, MailboxMessage])],
  controllers: [MailController],
  providers: [MailService, SmtpFakeService],
  exports: [MailService, SmtpFakeService],
})
export class MailModule {}
