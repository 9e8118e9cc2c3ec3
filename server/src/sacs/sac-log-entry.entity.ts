import { Entity, Enum, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BROOD_STAGES, CARE_LOG_KINDS, type BroodStage, type CareLogKind, type TemperatureUnit } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Sac } from './sac.entity';

/**
 * One care-log entry: an instant and a value. Never edited; a `strike` entry corrects an older
 * one (each entry can be struck once), and a struck roll no longer counts for the schedule.
 */
@Entity({ tableName: 'sac_log_entries' })
@Index({ properties: ['sac', 'at', 'createdAt', 'id'] })
export class SacLogEntry extends BaseEntity {
  @ManyToOne(() => Sac, { deleteRule: 'cascade' })
  sac!: Sac;

  @Enum({ items: [...CARE_LOG_KINDS], nativeEnumName: 'care_log_kind' })
  kind!: CareLogKind;

  @Property({ type: 'timestamptz' })
  at!: Date;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  author?: User | null;

  @Property({ type: 'double', nullable: true })
  temperatureC?: number | null;

  @Property({ type: 'double', nullable: true })
  enteredValue?: number | null;

  @Enum({ items: ['C', 'F'], nullable: true })
  enteredUnit?: TemperatureUnit | null;

  @Property({ type: 'double', nullable: true })
  humidityPercent?: number | null;

  @Enum({ items: [...BROOD_STAGES], nativeEnumName: 'brood_stage', nullable: true })
  stage?: BroodStage | null;

  @Property({ type: 'text', nullable: true })
  text?: string | null;

  @ManyToOne(() => SacLogEntry, { nullable: true, deleteRule: 'restrict' })
  @Unique({ name: 'sac_log_entries_strikes_unique' })
  strikes?: SacLogEntry | null;
}
