import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { ACTIVITY_AUDIENCES, type ActivityAudience } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Project } from '../projects/project.entity';

/**
 * One row per event (who, what, when, on what): the project timeline, "recent activity" and the
 * audit trail all read this table. Written in the same transaction as the change it records.
 */
@Entity({ tableName: 'activity_events' })
@Index({ properties: ['project', 'at'] })
export class ActivityEvent extends BaseEntity<'audience' | 'data'> {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  actor?: User | null;

  @Property({ type: 'text' })
  kind!: string;

  @Property({ type: 'text' })
  subjectType!: string;

  @Property({ type: 'uuid', nullable: true })
  subjectId?: string | null;

  @Property({ type: 'text' })
  summary!: string;

  @Property({ type: 'jsonb' })
  data: Record<string, unknown> = {};

  @Enum({ items: [...ACTIVITY_AUDIENCES], nativeEnumName: 'activity_audience' })
  audience: ActivityAudience = 'members';

  @Property({ type: 'timestamptz' })
  at: Date = new Date();
}
