import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Animal } from './animal.entity';

/**
 * One feeding of an animal. Never edited: a correction is a new entry that `strikes` this one with
 * a `reason` (each entry can be struck once), the way sac care-log entries are corrected.
 */
@Entity({ tableName: 'feeding_entries' })
@Index({ properties: ['animal', 'fedOn'] })
export class FeedingEntry extends BaseEntity {
  @ManyToOne(() => Animal, { deleteRule: 'cascade' })
  animal!: Animal;

  @Property({ type: 'date' })
  fedOn!: string;

  @Property({ type: 'text' })
  prey!: string;

  @Property({ type: 'boolean' })
  taken!: boolean;

  @Property({ type: 'text', nullable: true })
  note?: string | null;

  @ManyToOne(() => FeedingEntry, { nullable: true, deleteRule: 'restrict' })
  @Unique({ name: 'feeding_entries_strikes_unique' })
  strikes?: FeedingEntry | null;

  /** Why the struck entry was wrong (only with `strikes`). */
  @Property({ type: 'text', nullable: true })
  reason?: string | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  recordedBy?: User | null;
}
