import { Collection, Entity, Enum, ManyToOne, OneToMany, Property, Unique } from '@mikro-orm/core';
import { BROOD_STAGES, FAILURE_CLAUSES, SHIPPING_PAYERS, type BroodStage, type FailureClause, type ShippingPayer } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Project } from './project.entity';
import { TermsLine } from './terms-line.entity';
import { TermsAcceptance } from './terms-acceptance.entity';

/** One version of a project's terms; never changed once written (a change is a new version). */
@Entity({ tableName: 'terms_versions' })
@Unique({ properties: ['project', 'number'] })
export class TermsVersion extends BaseEntity {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  /** 1, 2, … per project. */
  @Property({ type: 'integer' })
  number!: number;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  createdBy!: User;

  @Property({ type: 'integer' })
  pricePerSpiderlingMinor!: number;

  @Property({ type: 'string', columnType: 'char(3)' })
  currency!: string;

  @Enum({ items: [...FAILURE_CLAUSES], nativeEnumName: 'terms_failure_clause' })
  failureClause!: FailureClause;

  @Enum({ items: [...BROOD_STAGES], nativeEnumName: 'terms_hand_over_stage' })
  handOverStage!: BroodStage;

  @Enum({ items: [...SHIPPING_PAYERS], nativeEnumName: 'terms_shipping_payer' })
  shippingPaidBy!: ShippingPayer;

  @Property({ type: 'text', nullable: true })
  note?: string | null;

  @OneToMany(() => TermsLine, (l) => l.version)
  lines = new Collection<TermsLine>(this);

  @OneToMany(() => TermsAcceptance, (a) => a.version)
  acceptances = new Collection<TermsAcceptance>(this);
}
