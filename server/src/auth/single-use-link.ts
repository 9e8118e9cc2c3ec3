import { ManyToOne, Property, type Ref } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/** The columns of a link e-mailed to an account that works once until it expires; only the SHA-256 of its token is stored. */
export abstract class SingleUseLink<Optional = never> extends BaseEntity<'usedAt' | Optional> {
  @ManyToOne(() => User, { ref: true, deleteRule: 'cascade' })
  user!: Ref<User>;

  @Property({ type: 'text', unique: true })
  tokenHash!: string;

  @Property({ type: 'timestamptz' })
  expiresAt!: Date;

  @Property({ type: 'timestamptz', nullable: true })
  usedAt?: Date | null = null;
}
