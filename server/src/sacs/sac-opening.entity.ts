import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Sac } from './sac.entity';

/**
 * The inspection when a sac is opened; it starts the brood's counts. One first opening per sac
 * (a partial unique index); a correction is a further row that `corrects` (strikes) the one before.
 */
@Entity({ tableName: 'sac_openings' })
@Index({
  name: 'sac_openings_first_per_sac_unique',
  expression: 'create unique index "sac_openings_first_per_sac_unique" on "sac_openings" ("sac_id") where "corrects_id" is null',
})
export class SacOpening extends BaseEntity<'estimated'> {
  @ManyToOne(() => Sac, { deleteRule: 'cascade' })
  sac!: Sac;

  @Property({ type: 'timestamptz' })
  openedAt!: Date;

  @Property({ type: 'integer' })
  healthyEggs!: number;

  @Property({ type: 'integer' })
  eggsWithLegs!: number;

  @Property({ type: 'integer' })
  nymphs!: number;

  @Property({ type: 'integer' })
  darkEggs!: number;

  @Property({ type: 'integer' })
  spoiledEggs!: number;

  @Property({ type: 'integer' })
  keptBack!: number;

  @Property({ type: 'text', nullable: true })
  notes?: string | null;

  /** The numbers are an estimate, not counted one by one; the first brood count is then one too. */
  @Property({ type: 'boolean' })
  estimated: boolean = false;

  /** Why counts outside the species' usual range are right (an acknowledged plausibility warning). */
  @Property({ type: 'text', nullable: true })
  warningReason?: string | null;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  recordedBy!: User;

  @ManyToOne(() => SacOpening, { nullable: true, deleteRule: 'cascade' })
  @Unique({ name: 'sac_openings_corrects_id_unique' }) // struck once: one correction per row
  corrects?: SacOpening | null;

  /** Why the corrected opening was wrong. */
  @Property({ type: 'text', nullable: true })
  reason?: string | null;
}
