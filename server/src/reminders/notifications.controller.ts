import { Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { NOTIFICATION_PAGE_SIZE, type NotificationPage, type NotificationResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { NotificationsService } from './notifications.service';
import { NotificationListQueryDto } from './dto/notification-list-query.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** One's own notifications only: every query is by the caller, so another user's id is a 404. */
@Controller('notifications')
export class NotificationsController {
  constructor(private readonly notifications: NotificationsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() q: NotificationListQueryDto): Promise<NotificationPage> {
    return this.notifications.list(user, q.limit ?? NOTIFICATION_PAGE_SIZE, q.offset ?? 0);
  }

  @Post('read-all')
  @HttpCode(200)
  readAll(@CurrentUser() user: AuthUser): Promise<{ marked: number }> {
    return this.notifications.markAllRead(user);
  }

  @Post(':id/read')
  @HttpCode(200)
  read(@CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<NotificationResponse> {
    return this.notifications.markRead(user, id);
  }
}
