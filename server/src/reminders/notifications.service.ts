import { Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { NotificationResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { Notification } from './notification.entity';
import { toNotificationResponse } from './reminders.service';
import { Clock } from '../common/clock';

@Injectable()
export class NotificationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
  ) {}

  /** The caller's own reminders, newest first. */
  async list(viewer: AuthUser): Promise<NotificationResponse[]> {
    const rows = await this.em.find(Notification, { user: viewer.id }, { orderBy: { createdAt: 'desc', id: 'asc' }, limit: 100 });
    return rows.map(toNotificationResponse);
  }

  async markRead(viewer: AuthUser, id: string): Promise<NotificationResponse> {
    const n = await this.em.findOne(Notification, { id, user: viewer.id });
    if (!n) throw new NotFoundException({ message: 'There is no such notification.' });
    n.readAt ??= this.clock.now();
    await this.em.flush();
    return toNotificationResponse(n);
  }
}
