import type { NotificationResponse } from '@broodsilk/shared';
import type { Notification } from './notification.entity';

export function toNotificationResponse(n: Notification): NotificationResponse {
  return {
    id: n.id,
    kind: n.kind,
    title: n.title,
    body: n.body,
    subject: n.subjectType && n.subjectId ? { type: n.subjectType, id: n.subjectId } : null,
    projectId: n.projectId ?? null,
    createdAt: n.createdAt.toISOString(),
    readAt: n.readAt?.toISOString() ?? null,
  };
}
