import { Check, Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import type { EndedEarlyReason } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Animal } from '../animals/animal.entity';

/**
 * One breeding attempt: a female and a male from the owner's collection. The stage is never
 * stored; it is derived from the project's events (pairings, molts, sacs) every time it is shown.
 */
@Entity({ tableName: 'projects' })
@Index({ properties: ['owner', 'createdAt'] })
@Check({ name: 'projects_two_animals_check', expression: 'female_id <> male_id' })
export class Project extends BaseEntity<'caretakersMayPullAndOpen'> {
  /** The keeper who runs it; also a member with role `owner`. */
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  owner!: User;

  @ManyToOne(() => Animal, { deleteRule: 'restrict' })
  female!: Animal;

  @ManyToOne(() => Animal, { deleteRule: 'restrict' })
  male!: Animal;

  @Property({ type: 'text' })
  title!: string;

  @Property({ type: 'text', nullable: true })
  notes?: string | null;

  /** Set when the owner calls the project off. */
  @Enum({ items: ['no-sac', 'female-molted', 'sac-failed', 'sac-eaten', 'male-died'], nativeEnumName: 'ended_early_reason', nullable: true })
  endedEarlyReason?: EndedEarlyReason | null;

  @Property({ type: 'text', nullable: true })
  endedEarlyNote?: string | null;

  @Property({ type: 'date', nullable: true })
  endedOn?: string | null;

  @Property({ type: 'date', nullable: true })
  closedOn?: string | null;

  /** The owner lets caretakers record the pull and the opening of the project's sacs. */
  @Property({ type: 'boolean' })
  caretakersMayPullAndOpen: boolean = false;

  /** Why the project was started despite a plausibility warning. */
  @Property({ type: 'text', nullable: true })
  warningReason?: string | null;
}
