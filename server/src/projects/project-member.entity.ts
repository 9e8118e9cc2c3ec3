import { Entity, Enum, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { PROJECT_ROLES, type ProjectRole } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Project } from './project.entity';

/**
 * A party of a project: a keeper of this instance (`user` set) or an outside party known by
 * name and e-mail only. Outside parties hold shares in the terms but cannot sign in until they
 * accept an invitation, which links `user`.
 */
@Entity({ tableName: 'project_members' })
@Unique({ properties: ['project', 'user'] })
@Index({ name: 'project_members_user_id_index', properties: ['user'] })
export class ProjectMember extends BaseEntity {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  user?: User | null;

  @Enum({ items: [...PROJECT_ROLES], nativeEnumName: 'project_role' })
  role!: ProjectRole;

  /** The party's name as the owner wrote it; for keepers their display name is shown instead. */
  @Property({ type: 'text' })
  name!: string;

  @Property({ type: 'text', nullable: true })
  email?: string | null;
}
