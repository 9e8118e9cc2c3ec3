import { Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { ProjectMember } from './project-member.entity';
import { TermsVersion } from './terms-version.entity';

/**
 * A party's acceptance of a version. `recordedBy` is the party's own account, or the owner when
 * they record an outside party's acceptance on their behalf (`onBehalf`, with a note saying how).
 */
@Entity({ tableName: 'terms_acceptances' })
@Unique({ properties: ['version', 'member'] })
export class TermsAcceptance extends BaseEntity<'onBehalf'> {
  @ManyToOne(() => TermsVersion, { deleteRule: 'cascade' })
  version!: TermsVersion;

  @ManyToOne(() => ProjectMember, { deleteRule: 'restrict' })
  member!: ProjectMember;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  recordedBy!: User;

  @Property({ type: 'boolean' })
  onBehalf: boolean = false;

  @Property({ type: 'text', nullable: true })
  note?: string | null;
}
