import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { NOTIFICATION_KINDS, type NotificationKind } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/** An in-app reminder for one user (the same text goes out by e-mail). */
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

  @Enum({ items: ['sac', 'animal'], nativeEnumName: 'notification_subject' })
  subjectType!: 'sac' | 'animal';

  @Property({ type: 'uuid' })
  subjectId!: string;

  @Property({ type: 'uuid', nullable: true })
  projectId?: string | null;

  @Property({ type: 'timestamptz', nullable: true })
  readAt?: Date | null;
}
