import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post, Put, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import {
  ListNotificationsQuery,
  MarkedReadDto,
  NotificationDto,
  NotificationPageDto,
  NotificationSettingDto,
  UnreadCountDto,
  UpdateNotificationSettingsDto,
} from './dto/notification.dto.js';
import { NotificationsService } from './notifications.service.js';

@ApiTags('notifications')
@ApiBearerAuth()
@Controller('notifications')
export class NotificationsController {
  constructor(private readonly notifications: NotificationsService) {}

  @Get()
  @ApiOperation({ summary: 'Your notifications, newest first, with the unread count' })
  @ApiOkResponse({ type: NotificationPageDto })
  list(@CurrentUser() user: AuthUser, @Query() q: ListNotificationsQuery): Promise<NotificationPageDto> {
    return this.notifications.list(user, q.page, q.pageSize, q.unread === true);
  }

  @Get('unread-count')
  @ApiOperation({ summary: 'How many of your notifications are unread (the count in the header)' })
  @ApiOkResponse({ type: UnreadCountDto })
  async unread(@CurrentUser() user: AuthUser): Promise<UnreadCountDto> {
    return { unread: await this.notifications.unread(user) };
  }

  @Post('read-all')
  @HttpCode(200)
  @ApiOperation({ summary: 'Mark every notification of yours read' })
  @ApiOkResponse({ type: MarkedReadDto })
  async readAll(@CurrentUser() user: AuthUser): Promise<MarkedReadDto> {
    return { marked: await this.notifications.markAllRead(user) };
  }

  @Post(':notificationId/read')
  @HttpCode(200)
  @ApiOperation({ summary: 'Mark one of your notifications read (404 for anyone else’s)' })
  @ApiOkResponse({ type: NotificationDto })
  read(
    @CurrentUser() user: AuthUser,
    @Param('notificationId', ParseIntPipe) id: number,
  ): Promise<NotificationDto> {
    return this.notifications.markRead(user, id);
  }

  @Get('settings')
  @ApiOperation({ summary: 'What you are told about, per kind: in the app and by mail' })
  @ApiOkResponse({ type: [NotificationSettingDto] })
  settings(@CurrentUser() user: AuthUser): Promise<NotificationSettingDto[]> {
    return this.notifications.getSettings(user);
  }

  @Put('settings')
  @ApiOperation({ summary: 'Turn kinds on or off, in the app and by mail' })
  @ApiOkResponse({ type: [NotificationSettingDto] })
  updateSettings(
    @CurrentUser() user: AuthUser,
    @Body() dto: UpdateNotificationSettingsDto,
  ): Promise<NotificationSettingDto[]> {
    return this.notifications.updateSettings(user, dto);
  }
}
