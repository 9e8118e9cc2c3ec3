import { Entity, OneToOne } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Project } from '../projects/project.entity';

/**
 * One row per project's account. Writes that take young out of a share lock it
 * (`SELECT … FOR UPDATE`) before computing the balance, so two at once cannot both pass.
 */
@Entity({ tableName: 'project_accounts' })
export class ProjectAccount extends BaseEntity {
  @OneToOne(() => Project, { owner: true, deleteRule: 'cascade', unique: true })
  project!: Project;
}
