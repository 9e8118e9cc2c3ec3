import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { PAIRING_OUTCOMES, type PairingOutcome } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Project } from './project.entity';

/** One pairing attempt: when the male went in, for how long, how it went. */
@Entity({ tableName: 'pairings' })
@Index({ properties: ['project', 'startedAt'] })
export class Pairing extends BaseEntity {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  @Property({ type: 'timestamptz' })
  startedAt!: Date;

  /** Calendar date of `startedAt` in the owner's time zone, fixed when recorded so stages never shift. */
  @Property({ type: 'date' })
  startedOn!: string;

  @Property({ type: 'integer' })
  durationMinutes!: number;

  @Enum({ items: [...PAIRING_OUTCOMES], nativeEnumName: 'pairing_outcome' })
  outcome!: PairingOutcome;

  @Property({ type: 'text', nullable: true })
  notes?: string | null;

  @ManyToOne(() => User, { deleteRule: 'restrict' })
  recordedBy!: User;
}
