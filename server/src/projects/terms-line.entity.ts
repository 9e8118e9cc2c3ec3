import { Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { ProjectMember } from './project-member.entity';
import { TermsVersion } from './terms-version.entity';

/** One party's line in a terms version. */
@Entity({ tableName: 'terms_lines' })
@Unique({ properties: ['version', 'member'] })
@Unique({ properties: ['version', 'pickOrder'] })
export class TermsLine extends BaseEntity {
  @ManyToOne(() => TermsVersion, { deleteRule: 'cascade' })
  version!: TermsVersion;

  @ManyToOne(() => ProjectMember, { deleteRule: 'restrict' })
  member!: ProjectMember;

  @Property({ type: 'integer' })
  weight!: number;

  @Property({ type: 'integer' })
  fixedCount!: number;

  @Property({ type: 'integer' })
  pickOrder!: number;
}
