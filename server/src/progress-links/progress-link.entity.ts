import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { ProjectMember } from '../projects/project-member.entity';

/**
 * A read-only link for an outside party (a project member without an account) to follow the
 * project. Only the SHA-256 of its token is stored, so the link is shown once; issuing a new one
 * revokes the earlier ones of that party.
 */
@Entity({ tableName: 'progress_links' })
@Index({ properties: ['member', 'revokedAt'] })
export class ProgressLink extends BaseEntity {
  @ManyToOne(() => ProjectMember, { deleteRule: 'cascade' })
  member!: ProjectMember;

  @Property({ type: 'text', hidden: true })
  @Unique()
  tokenHash!: string;

  /** Who issued it (the project's owner); kept when their account goes. */
  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  createdBy?: User | null;

  @Property({ type: 'timestamptz', nullable: true })
  revokedAt?: Date | null;
}
