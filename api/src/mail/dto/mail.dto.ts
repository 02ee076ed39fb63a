import { ApiProperty } from '@nestjs/swagger';
import { MAIL_KINDS } from '../models/outbox-message.model.js';

export class MailboxMessageDto {
  @ApiProperty() id: number;
  @ApiProperty() from: string;
  @ApiProperty() to: string;
  @ApiProperty() subject: string;
  @ApiProperty() text: string;
  @ApiProperty({ format: 'date-time' }) receivedAt: string;
}

export class OutboxMessageDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: MAIL_KINDS }) kind: string;
  @ApiProperty() to: string;
  @ApiProperty() subject: string;
  @ApiProperty({ enum: ['pending', 'sent'] }) status: string;
  @ApiProperty() attempts: number;
  @ApiProperty({ nullable: true, type: String }) lastError: string | null;
  @ApiProperty({ format: 'date-time' }) nextAttemptAt: string;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) sentAt: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class FlushResultDto {
  @ApiProperty() sent: number;
  @ApiProperty() failed: number;
}
