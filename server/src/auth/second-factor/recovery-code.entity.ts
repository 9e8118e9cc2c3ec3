import { Entity, Index, ManyToOne, Property, type Ref } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { User } from '../../users/user.entity';

/** One single-use recovery code; only its SHA-256 is stored (the code carries 120 random bits). */
@Entity({ tableName: 'recovery_codes' })
@Index({ properties: ['user', 'codeHash'] })
export class RecoveryCode extends BaseEntity<'usedAt'> {
  @ManyToOne(() => User, { ref: true, deleteRule: 'cascade' })
  user!: Ref<User>;

  @Property({ type: 'text' })
  codeHash!: string;

  @Property({ type: 'timestamptz', nullable: true })
  usedAt?: Date | null = null;
}
