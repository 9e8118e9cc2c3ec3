import { Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { NotificationPage, NotificationResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { Clock } from '../common/clock';
import { Notification } from './notification.entity';
import { toNotificationResponse } from './notifications.mapper';
import { refusal } from '../common/refusal';

@Injectable()
export class NotificationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
  ) {}

  /** The caller's own notifications, newest first, one page at a time, with the unread count. */
  async list(viewer: AuthUser, limit: number, offset: number): Promise<NotificationPage> {
    const [[rows, total], unread] = await Promise.all([
      this.em.findAndCount(Notification, { user: viewer.id }, { orderBy: { createdAt: 'desc', id: 'asc' }, limit, offset }),
      this.em.count(Notification, { user: viewer.id, readAt: null }),
    ]);
    return { items: rows.map(toNotificationResponse), total, unread };
  }

  async markRead(viewer: AuthUser, id: string): Promise<NotificationResponse> {
    const n = await this.em.findOne(Notification, { id, user: viewer.id });
    if (!n) throw new NotFoundException(refusal('reminder.noSuchNotification'));
    n.readAt ??= this.clock.now();
    await this.em.flush();
    return toNotificationResponse(n);
  }

  /** Marks every unread one of the caller's as read now; answers how many were. */
  async markAllRead(viewer: AuthUser): Promise<{ marked: number }> {
    const marked = await this.em.nativeUpdate(Notification, { user: viewer.id, readAt: null }, { readAt: this.clock.now() });
    return { marked };
  }
}
