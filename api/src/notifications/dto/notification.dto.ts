import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsOptional, ValidateNested } from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { NOTIFICATION_KIND_NAMES, type NotificationKind } from '../notification-kinds.js';

export class ListNotificationsQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Only unread ones' })
  @IsOptional()
  @Transform(({ value }) => value === true || value === 'true')
  @IsBoolean()
  unread?: boolean;
}

export class NotificationActorDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() role: string;
}

export class NotificationDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: NOTIFICATION_KIND_NAMES }) kind: NotificationKind;
  @ApiProperty({ description: 'What happened, in one line' }) title: string;
  @ApiProperty({ description: 'Which item, and the note that came with it' }) body: string;
  @ApiProperty({ description: 'Where the web app shows it, e.g. /discrepancies/12' }) webPath: string;
  @ApiProperty({ nullable: true, type: Number }) projectId: number | null;
  @ApiProperty({ nullable: true, type: Number }) submittalId: number | null;
  @ApiProperty({ nullable: true, type: Number }) discrepancyId: number | null;
  @ApiProperty({ nullable: true, type: NotificationActorDto }) actor: NotificationActorDto | null;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) readAt: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class NotificationPageDto {
  @ApiProperty({ type: [NotificationDto] }) items: NotificationDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
  @ApiProperty({ description: 'Unread notifications in all' }) unread: number;
}

export class UnreadCountDto {
  @ApiProperty() unread: number;
}

export class MarkedReadDto {
  @ApiProperty({ description: 'How many were marked read now' }) marked: number;
}

export class NotificationSettingDto {
  @ApiProperty({ enum: NOTIFICATION_KIND_NAMES }) kind: NotificationKind;
  @ApiProperty() label: string;
  @ApiProperty() description: string;
  @ApiProperty({ description: 'Shown in the app' }) inApp: boolean;
  @ApiProperty({ description: 'Sent by mail' }) mail: boolean;
}

export class NotificationSettingInput {
  @ApiProperty({ enum: NOTIFICATION_KIND_NAMES }) @IsIn(NOTIFICATION_KIND_NAMES) kind: NotificationKind;
  @ApiProperty() @IsBoolean() inApp: boolean;
  @ApiProperty() @IsBoolean() mail: boolean;
}

export class UpdateNotificationSettingsDto {
  @ApiProperty({ type: [NotificationSettingInput] })
  @IsArray()
  @ArrayMaxSize(NOTIFICATION_KIND_NAMES.length)
  @ValidateNested({ each: true })
  @Type(() => NotificationSettingInput)
  settings: NotificationSettingInput[];
}
