import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BROOD_STAGES, SAC_FAILURE_REASONS, SAC_OUTCOMES, type BroodStage, type SacFailureReason, type SacOutcomeState } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Project } from '../projects/project.entity';

/** One egg sac of a project, from its lay date to the end of incubation. */
@Entity({ tableName: 'sacs' })
@Index({ properties: ['project', 'layDate'] })
export class Sac extends BaseEntity<'outcome' | 'rollIntervalHours' | 'rollingOff' | 'broodStage' | 'leftWithMother' | 'rollPastLegs'> {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  /** A calendar date in the keeper's zone (no time): day 0. */
  @Property({ type: 'date' })
  layDate!: string;

  /** The pull instant; null while the mother keeps the sac. */
  @Property({ type: 'timestamptz', nullable: true })
  pulledAt?: Date | null;

  /** Calendar date of `pulledAt` in the recorder's zone, fixed when recorded (like pairings). */
  @Property({ type: 'date', nullable: true })
  pulledOn?: string | null;

  @Enum({ items: [...SAC_OUTCOMES], nativeEnumName: 'sac_outcome' })
  outcome: SacOutcomeState = 'in-progress';

  @Enum({ items: [...SAC_FAILURE_REASONS], nativeEnumName: 'sac_failure_reason', nullable: true })
  failureReason?: SacFailureReason | null;

  /** Per-sac override of the species / default pull window; both or neither. */
  @Property({ type: 'smallint', nullable: true })
  pullFromDay?: number | null;

  @Property({ type: 'smallint', nullable: true })
  pullToDay?: number | null;

  @Property({ type: 'smallint' })
  rollIntervalHours: number = 12;

  @Property({ type: 'boolean' })
  rollingOff: boolean = false;

  /** The keeper left the sac with the mother on purpose (never set together with a pull). */
  @Property({ type: 'boolean' })
  leftWithMother: boolean = false;

  /** Keep rolling after the legs have formed (the default stops there, docs/trade-facts.md §4). */
  @Property({ type: 'boolean' })
  rollPastLegs: boolean = false;

  /** The incubator or container, in the keeper's words. */
  @Property({ type: 'text', nullable: true })
  container?: string | null;

  /** The sac's own target band; each pair both or neither (neither: the default band). */
  @Property({ type: 'double', nullable: true })
  bandTemperatureMinC?: number | null;

  @Property({ type: 'double', nullable: true })
  bandTemperatureMaxC?: number | null;

  @Property({ type: 'double', nullable: true })
  bandHumidityMin?: number | null;

  @Property({ type: 'double', nullable: true })
  bandHumidityMax?: number | null;

  /** Follows the care log's stage entries (the latest one not struck); `eggs` until then. */
  @Enum({ items: [...BROOD_STAGES], nativeEnumName: 'brood_stage' })
  broodStage: BroodStage = 'eggs';

  @Property({ type: 'text', nullable: true })
  notes?: string | null;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  recordedBy!: User;

  /** Why an unusual lay date (an acknowledged plausibility warning) is right. */
  @Property({ type: 'text', nullable: true })
  warningReason?: string | null;
}
