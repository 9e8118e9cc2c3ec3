import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { INVITABLE_ROLES, type InvitableRole } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';

/** An e-mailed, single-use invitation into a project. Only the SHA-256 of its token is stored. */
@Entity({ tableName: 'invitations' })
@Index({ properties: ['project', 'email'] })
export class Invitation extends BaseEntity {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  /** Lower-cased. */
  @Property({ type: 'text' })
  email!: string;

  @Enum({ items: [...INVITABLE_ROLES], nativeEnumName: 'invitable_role' })
  role!: InvitableRole;

  /** The outside party whose account this links, if any. */
  @ManyToOne(() => ProjectMember, { nullable: true, deleteRule: 'cascade' })
  member?: ProjectMember | null;

  @Property({ type: 'text', unique: true, hidden: true })
  tokenHash!: string;

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  invitedBy!: User;

  @Property({ type: 'timestamptz' })
  expiresAt!: Date;

  @Property({ type: 'timestamptz', nullable: true })
  acceptedAt?: Date | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  acceptedBy?: User | null;

  /** Another account than the invited address opened the link; it joins only once the owner approves. */
  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  claimedBy?: User | null;

  @Property({ type: 'timestamptz', nullable: true })
  claimedAt?: Date | null;

  /** Set when a newer invitation to the same e-mail replaced this one. */
  @Property({ type: 'timestamptz', nullable: true })
  replacedAt?: Date | null;
}
