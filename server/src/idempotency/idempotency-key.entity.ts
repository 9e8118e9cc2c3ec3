import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/**
 * One `Idempotency-Key` a user sent with a write, and the first answer to it. The unique
 * (user, key) pair lets only one of two simultaneous repeats claim the key; `status` stays null
 * until the write has answered.
 */
@Entity({ tableName: 'idempotency_keys' })
@Unique({ properties: ['user', 'key'] })
@Index({ properties: ['expiresAt'] })
export class IdempotencyKey extends BaseEntity {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  user!: User;

  @Property({ type: 'text' })
  key!: string;

  @Property({ type: 'text' })
  method!: string;

  @Property({ type: 'text' })
  path!: string;

  /** SHA-256 of method, path and body: the same key with another request is refused. */
  @Property({ type: 'text' })
  fingerprint!: string;

  @Property({ type: 'integer', nullable: true })
  status?: number | null;

  @Property({ type: 'jsonb', nullable: true })
  body?: unknown;

  @Property({ type: 'timestamptz' })
  expiresAt!: Date;
}
