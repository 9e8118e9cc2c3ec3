import { Check, Entity, Enum, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BROOD_LOSS_REASONS, BROOD_STAGES, type BroodLossReason, type BroodStage } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Sac } from './sac.entity';

/**
 * A live count of a sac's brood at one instant; the latest one not struck is the count of young in
 * care. Counts are never edited: a correction is a new count that `corrects` (strikes) the old one.
 */
@Entity({ tableName: 'brood_counts' })
@Index({ properties: ['sac', 'at'] })
@Check({ name: 'brood_counts_non_negative_check', expression: 'alive >= 0 and lost >= 0' })
export class BroodCount extends BaseEntity<'lost' | 'source' | 'estimated'> {
  @ManyToOne(() => Sac, { deleteRule: 'cascade' })
  sac!: Sac;

  @Property({ type: 'timestamptz' })
  at!: Date;

  @Enum({ items: [...BROOD_STAGES], nativeEnumName: 'brood_stage' })
  stage!: BroodStage;

  @Property({ type: 'integer' })
  alive!: number;

  /** Lost since the previous count. */
  @Property({ type: 'integer' })
  lost: number = 0;

  @Enum({ items: [...BROOD_LOSS_REASONS], nativeEnumName: 'brood_loss_reason', nullable: true })
  lossReason?: BroodLossReason | null;

  @Property({ type: 'text', nullable: true })
  note?: string | null;

  @Enum({ items: ['opening', 'count'], nativeEnumName: 'brood_count_source' })
  source: 'opening' | 'count' = 'count';

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  recordedBy?: User | null;

  /** Young not counted one by one; a higher count after an estimate only warns. */
  @Property({ type: 'boolean' })
  estimated: boolean = false;

  /** The count this one corrects; that one stays, struck. */
  @ManyToOne(() => BroodCount, { nullable: true, deleteRule: 'cascade' })
  @Unique({ name: 'brood_counts_corrects_id_unique' }) // struck once: one correction per row
  corrects?: BroodCount | null;

  /** Why the corrected count was wrong. */
  @Property({ type: 'text', nullable: true })
  reason?: string | null;

  /** Why an unusual count (an acknowledged plausibility warning) is right. */
  @Property({ type: 'text', nullable: true })
  warningReason?: string | null;
}
