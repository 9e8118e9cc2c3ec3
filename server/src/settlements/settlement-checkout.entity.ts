import { Entity, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { User } from '../users/user.entity';

/** A checkout session started for a settlement payment; the webhook finds the payment's parties here. */
@Entity({ tableName: 'settlement_checkouts' })
export class SettlementCheckout extends BaseEntity {
  @Property({ type: 'text', unique: true })
  sessionId!: string;

  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  @ManyToOne(() => ProjectMember, { deleteRule: 'no action' })
  fromParty!: ProjectMember;

  @ManyToOne(() => ProjectMember, { deleteRule: 'no action' })
  toParty!: ProjectMember;

  @Property({ type: 'integer' })
  amountMinor!: number;

  @Property({ type: 'string', columnType: 'char(3)' })
  currency!: string;

  @Property({ type: 'text' })
  destinationAccountId!: string;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  createdBy!: User;
}
