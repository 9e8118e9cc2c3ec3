import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import type { ShareResult } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { Project } from '../projects/project.entity';

/**
 * The basis a sac's shares were last worked out on (count + terms version), one row per change,
 * so the account can say what changed and why. Rows are only ever added.
 */
@Entity({ tableName: 'share_bases' })
@Unique({ properties: ['sacId', 'revision'] })
@Index({ properties: ['project'] })
export class ShareBasis extends BaseEntity {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  @Property({ type: 'uuid' })
  sacId!: string;

  /** 1, 2, … per sac. */
  @Property({ type: 'integer' })
  revision!: number;

  @Property({ type: 'integer' })
  count!: number;

  /** Null while no terms are in force. */
  @Property({ type: 'integer', nullable: true })
  termsNumber?: number | null;

  @Property({ type: 'json' })
  result!: ShareResult;
}
