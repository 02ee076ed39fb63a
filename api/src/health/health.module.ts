import { Module } from '@nestjs/common';
import { DatabaseModule } from '../database/database.module.js';
import { MailModule } from '../mail/mail.module.js';
import { HealthController } from './health.controller.js';

@Module({ imports: [DatabaseModule, MailModule], controllers: [HealthController] })
export class HealthModule {}
