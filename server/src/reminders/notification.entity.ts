import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { NOTIFICATION_KINDS, NOTIFICATION_SUBJECT_TYPES, type NotificationKind, type NotificationSubjectType } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/** An in-app reminder or partner update for one user (the same words go out by e-mail when chosen). */
@Entity({ tableName: 'notifications' })
@Index({ properties: ['user', 'createdAt'] })
export class Notification extends BaseEntity {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  user!: User;

  @Enum({ items: [...NOTIFICATION_KINDS], nativeEnumName: 'notification_kind' })
  kind!: NotificationKind;

  @Property({ type: 'text' })
  title!: string;

  @Property({ type: 'text' })
  body!: string;

  /** What it is about (for a link); none for a daily digest. */
  @Enum({ items: [...NOTIFICATION_SUBJECT_TYPES], nativeEnumName: 'notification_subject', nullable: true })
  subjectType?: NotificationSubjectType | null;

  @Property({ type: 'uuid', nullable: true })
  subjectId?: string | null;

  @Property({ type: 'uuid', nullable: true })
  projectId?: string | null;

  @Property({ type: 'timestamptz', nullable: true })
  readAt?: Date | null;
}
