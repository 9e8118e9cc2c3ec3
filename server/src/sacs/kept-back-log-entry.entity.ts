import { Entity, Enum, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { KEPT_BACK_LOG_KINDS, type KeptBackLogKind } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { KeptBackBatch } from './kept-back-batch.entity';

/**
 * A roll or check of a kept-back batch. Its own small log, not the sac's care log: the batch's
 * rolls must not move the sac's roll schedule, reminders or incubator screen. Never edited; a
 * `strike` entry corrects an older one (each entry can be struck once).
 */
@Entity({ tableName: 'kept_back_log_entries' })
@Index({ properties: ['batch', 'at'] })
export class KeptBackLogEntry extends BaseEntity {
  @ManyToOne(() => KeptBackBatch, { deleteRule: 'cascade' })
  batch!: KeptBackBatch;

  @Enum({ items: [...KEPT_BACK_LOG_KINDS], nativeEnumName: 'kept_back_log_kind' })
  kind!: KeptBackLogKind;

  @Property({ type: 'timestamptz' })
  at!: Date;

  /** What a check found; for a strike, why. */
  @Property({ type: 'text', nullable: true })
  note?: string | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  recordedBy?: User | null;

  @ManyToOne(() => KeptBackLogEntry, { nullable: true, deleteRule: 'restrict' })
  @Unique({ name: 'kept_back_log_entries_strikes_unique' })
  strikes?: KeptBackLogEntry | null;
}
