import type { ActivityEventResponse } from '@broodsilk/shared';
import type { ActivityEvent } from './activity-event.entity';

/** Needs `actor` and `project` loaded. */
export function toActivityResponse(e: ActivityEvent): ActivityEventResponse {
  return {
    id: e.id,
    projectId: e.project.id,
    projectTitle: e.project.title,
    actor: e.actor ? { id: e.actor.id, name: e.actor.displayName } : null,
    kind: e.kind,
    subject: { type: e.subjectType, id: e.subjectId ?? null },
    summary: e.summary,
    data: e.data,
    at: e.at.toISOString(),
  };
}
