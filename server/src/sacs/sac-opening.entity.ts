import { Entity, ManyToOne, OneToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Sac } from './sac.entity';

/** The inspection when a sac is opened (one per sac); it starts the brood's counts. */
@Entity({ tableName: 'sac_openings' })
export class SacOpening extends BaseEntity {
  @OneToOne(() => Sac, { owner: true, deleteRule: 'cascade', unique: 'sac_openings_sac_id_unique' })
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

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  recordedBy!: User;
}
