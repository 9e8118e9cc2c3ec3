import { Entity, ManyToOne, Property, type Ref } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/** A single-use reset link; only the SHA-256 of the token is stored. */
@Entity({ tableName: 'password_reset_tokens' })
export class PasswordResetToken extends BaseEntity<'usedAt'> {
  @ManyToOne(() => User, { ref: true, deleteRule: 'cascade' })
  user!: Ref<User>;

  @Property({ type: 'text', unique: true })
  tokenHash!: string;

  @Property({ type: 'timestamptz' })
  expiresAt!: Date;

  @Property({ type: 'timestamptz', nullable: true })
  usedAt?: Date | null = null;
}
