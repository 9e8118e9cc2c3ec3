import { Entity, Enum, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { PAIRING_OUTCOMES, type PairingOutcome } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Animal } from '../animals/animal.entity';
import { Project } from './project.entity';

/** One pairing attempt: when the male went in, for how long, how it went. Corrected by a new row that `corrects` it. */
@Entity({ tableName: 'pairings' })
@Index({ properties: ['project', 'startedAt'] })
export class Pairing extends BaseEntity {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  /** The male put in: the project's first male, a backup, or a replacement after a death. */
  @ManyToOne(() => Animal, { deleteRule: 'restrict', index: 'pairings_male_id_index' })
  male!: Animal;

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

  /** The pairing this one corrects; that one stays, struck. */
  @ManyToOne(() => Pairing, { nullable: true, deleteRule: 'cascade' })
  @Unique({ name: 'pairings_corrects_id_unique' }) // struck once: one correction per row
  corrects?: Pairing | null;

  @Property({ type: 'text', nullable: true })
  reason?: string | null;

  /** Why an unusual pairing (an acknowledged plausibility warning) is right. */
  @Property({ type: 'text', nullable: true })
  warningReason?: string | null;
}
