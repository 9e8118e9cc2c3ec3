import { Check, Entity, Enum, ManyToOne, OneToOne, Property } from '@mikro-orm/core';
import { KEPT_BACK_STATES, type KeptBackState } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Sac } from './sac.entity';

/**
 * The eggs kept back at a sac's opening for more incubation. How many is the opening's own
 * `keptBack` (the opening in force), so a corrected opening never leaves two numbers to disagree.
 * The batch ends once: joined the brood (with how many) or written off, with an instant and a reason.
 */
@Entity({ tableName: 'kept_back_batches' })
@Check({ name: 'kept_back_batches_joined_check', expression: `(state = 'joined') = (joined is not null) and (joined is null or joined >= 0)` })
@Check({ name: 'kept_back_batches_ended_check', expression: `(state = 'incubating') = (ended_at is null)` })
export class KeptBackBatch extends BaseEntity<'state'> {
  @OneToOne(() => Sac, { owner: true, deleteRule: 'cascade', unique: 'kept_back_batches_sac_id_unique' })
  sac!: Sac;

  @Enum({ items: [...KEPT_BACK_STATES], nativeEnumName: 'kept_back_state' })
  state: KeptBackState = 'incubating';

  @Property({ type: 'timestamptz', nullable: true })
  endedAt?: Date | null;

  @Property({ type: 'integer', nullable: true })
  joined?: number | null;

  @Property({ type: 'text', nullable: true })
  reason?: string | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  endedBy?: User | null;
}
