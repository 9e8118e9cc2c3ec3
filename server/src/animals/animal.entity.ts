import { Entity, Enum, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import {
  ANIMAL_SEXES,
  ANIMAL_STATUSES,
  CUSTODIES,
  MATURITIES,
  OWNER_KINDS,
  type AnimalSex,
  type AnimalStatus,
  type Custody,
  type Maturity,
  type OwnerKind,
} from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';
import { Species } from '../species/species.entity';

/**
 * One animal in one keeper's collection. `recordedBy` holds the record and alone may edit it;
 * the owner may be someone else (a loaned male is recorded by the keeper holding him).
 * Dates are calendar dates (`YYYY-MM-DD`), kept as strings so no time zone can shift them.
 */
@Entity({ tableName: 'animals' })
@Unique({ properties: ['recordedBy', 'label'] })
@Index({ properties: ['recordedBy', 'createdAt'] })
@Index({ properties: ['recordedBy', 'species'] })
@Index({ properties: ['recordedBy', 'status'] })
@Index({ properties: ['recordedBy', 'sex', 'maturity'] })
// Trigram indexes for the search box (created by a migration; declared here so the schema diff knows them).
@Index({ name: 'animals_label_trgm_index', expression: 'create index "animals_label_trgm_index" on "animals" using gin (lower("label") gin_trgm_ops)' })
@Index({
  name: 'animals_enclosure_trgm_index',
  expression: 'create index "animals_enclosure_trgm_index" on "animals" using gin (lower("enclosure") gin_trgm_ops)',
})
@Index({ properties: ['recordedBy', 'maturedOn'] })
export class Animal extends BaseEntity<'maturity' | 'ownerKind' | 'custody' | 'status'> {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  recordedBy!: User;

  @ManyToOne(() => Species, { deleteRule: 'restrict' })
  species!: Species;

  @Property({ type: 'text' })
  label!: string;

  @Enum({ items: [...ANIMAL_SEXES], nativeEnumName: 'animal_sex' })
  sex!: AnimalSex;

  @Enum({ items: [...MATURITIES], nativeEnumName: 'animal_maturity' })
  maturity: Maturity = 'immature';

  @Property({ type: 'date', nullable: true })
  maturedOn?: string | null;

  @Property({ type: 'date', nullable: true })
  acquiredOn?: string | null;

  @Property({ type: 'text', nullable: true })
  acquiredFrom?: string | null;

  @Property({ type: 'integer', nullable: true })
  pricePaidMinor?: number | null;

  @Property({ type: 'string', columnType: 'char(3)', nullable: true })
  priceCurrency?: string | null;

  @Enum({ items: [...OWNER_KINDS], nativeEnumName: 'animal_owner_kind' })
  ownerKind: OwnerKind = 'self';

  /** Set for `self` (the recorder) and `keeper` (another keeper of this instance). */
  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  ownerUser?: User | null;

  @Property({ type: 'text', nullable: true })
  ownerName?: string | null;

  @Property({ type: 'text', nullable: true })
  ownerEmail?: string | null;

  @Enum({ items: [...CUSTODIES], nativeEnumName: 'animal_custody' })
  custody: Custody = 'with-owner';

  @Property({ type: 'text', nullable: true })
  custodyParty?: string | null;

  @Property({ type: 'date', nullable: true })
  dueBackOn?: string | null;

  @Enum({ items: [...ANIMAL_STATUSES], nativeEnumName: 'animal_status' })
  status: AnimalStatus = 'active';

  @Property({ type: 'date', nullable: true })
  statusOn?: string | null;

  @Property({ type: 'text', nullable: true })
  enclosure?: string | null;

  @Property({ type: 'text', nullable: true })
  notes?: string | null;

  @Property({ type: 'text', nullable: true })
  premoltNote?: string | null;

  /** Kept in step with the molt records (same transaction) so lists and readiness need no aggregate. */
  @Property({ type: 'date', nullable: true })
  lastMoltOn?: string | null;
}
