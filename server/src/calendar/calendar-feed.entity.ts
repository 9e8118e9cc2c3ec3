import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/**
 * A user's calendar feed. Only a hash of its token is stored; the token itself is derived from
 * the row id with the server's secret, so the owner can be shown the URL again. Rotating revokes
 * the row (its URL then 404s) and creates a new one.
 */
@Entity({ tableName: 'calendar_feeds' })
@Index({ properties: ['user', 'revokedAt'] })
export class CalendarFeed extends BaseEntity {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  user!: User;

  @Property({ type: 'text', hidden: true })
  @Unique()
  tokenHash!: string;

  @Property({ type: 'timestamptz', nullable: true })
  revokedAt?: Date | null;
}
