import { Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { ActivityAudience, ActivityEventResponse, ActivityTimelineQuery, ProjectRole } from '@broodsilk/shared';
import { ActivityEvent } from './activity-event.entity';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { toActivityResponse } from './activity.mapper';
import { Clock } from '../common/clock';
import { TIMELINE_PAGE } from './activity-timeline-query.dto';
import { refusal } from '../common/refusal';

export interface ActivityInput {
  projectId: string;
  /** Null for what the system did by itself (jobs, reminders). */
  actorId: string | null;
  /** Dotted name, e.g. `pairing.recorded`. */
  kind: string;
  subjectType: string;
  subjectId?: string | null;
  /** One sentence a person reads in the timeline. */
  summary: string;
  data?: Record<string, unknown>;
  /** `partners` hides the event from caretakers (money, terms). */
  audience?: ActivityAudience;
  at?: Date;
}

/** Which audiences a role sees. */
export function audiencesFor(role: ProjectRole): ActivityAudience[] {
  return role === 'caretaker' ? ['members'] : ['members', 'partners'];
}

@Injectable()
export class ActivityService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
  ) {}

  /**
   * Queues one event on `em`: pass the transaction's entity manager so the event is written in the
   * same transaction as the change it records (the caller's flush/commit writes it).
   */
  record(em: EntityManager, e: ActivityInput): ActivityEvent {
    return em.create(ActivityEvent, {
      project: em.getReference(Project, e.projectId),
      actor: e.actorId ? em.getReference(User, e.actorId) : null,
      kind: e.kind,
      subjectType: e.subjectType,
      subjectId: e.subjectId ?? null,
      summary: e.summary,
      data: e.data ?? {},
      audience: e.audience ?? 'members',
      at: e.at ?? this.clock.now(),
    });
  }

  /**
   * A project's timeline, newest first, as the viewer's role may see it, one page at a time by
   * keyset (at, created_at, id): the next page starts after the event named by `before`, so a page
   * costs the same however far back it is, and events added meanwhile neither repeat nor go missing.
   */
  async timeline(projectId: string, role: ProjectRole, page: ActivityTimelineQuery = {}): Promise<ActivityEventResponse[]> {
    const audiences = audiencesFor(role);
    let after = {};
    if (page.before) {
      const last = await this.em.findOne(ActivityEvent, { id: page.before, project: projectId, audience: { $in: audiences } }, { fields: ['at', 'createdAt'] });
      if (!last) throw new NotFoundException(refusal('timeline.noSuchEvent'));
      after = {
        $or: [{ at: { $lt: last.at } }, { at: last.at, createdAt: { $lt: last.createdAt } }, { at: last.at, createdAt: last.createdAt, id: { $lt: last.id } }],
      };
    }
    const rows = await this.em.find(
      ActivityEvent,
      { project: projectId, audience: { $in: audiences }, ...after },
      { populate: ['actor', 'project'], orderBy: { at: 'desc', createdAt: 'desc', id: 'desc' }, limit: page.limit ?? TIMELINE_PAGE },
    );
    return rows.map(toActivityResponse);
  }

  /** For the dashboard: what other people did lately in the user's projects, newest first. */
  async recentFromOthers(userId: string, limit = 20): Promise<ActivityEventResponse[]> {
    const memberships = await this.em.find(ProjectMember, { user: userId });
    if (!memberships.length) return [];
    const or = memberships.map((m) => ({ project: m.project.id, audience: { $in: audiencesFor(m.role) } }));
    const rows = await this.em.find(
      ActivityEvent,
      { $and: [{ $or: or }, { $or: [{ actor: null }, { actor: { $ne: userId } }] }] },
      { populate: ['actor', 'project'], orderBy: { at: 'desc', createdAt: 'desc' }, limit },
    );
    return rows.map(toActivityResponse);
  }
}
