import type { NotificationResponse } from '@broodsilk/shared';
import { paths } from '@/config/paths';

/** Where a notification leads: its sac, animal or project, or the day's overview for a digest. */
export function subjectHref(n: Pick<NotificationResponse, 'subject'>): string {
  if (!n.subject) return paths.home.href();
  if (n.subject.type === 'project') return paths.project.href(n.subject.id);
  return n.subject.type === 'sac' ? paths.sac.href(n.subject.id) : paths.animal.href(n.subject.id);
}
