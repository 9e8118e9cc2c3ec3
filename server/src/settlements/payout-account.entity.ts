import { Entity, OneToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/** A keeper's connected account at the payment provider, where settlement payments to them go. */
@Entity({ tableName: 'payout_accounts' })
export class PayoutAccount extends BaseEntity<'chargesEnabled' | 'payoutsEnabled' | 'detailsSubmitted'> {
  @OneToOne(() => User, { owner: true, deleteRule: 'cascade', unique: true })
  user!: User;

  @Property({ type: 'text', unique: true })
  providerAccountId!: string;

  @Property({ type: 'boolean' })
  chargesEnabled: boolean = false;

  @Property({ type: 'boolean' })
  payoutsEnabled: boolean = false;

  @Property({ type: 'boolean' })
  detailsSubmitted: boolean = false;
}
