import { Entity, Enum, Index, Property, Unique } from '@mikro-orm/core';
import { SPECIES_GROUPS, VENOM_FLAGS, type SpeciesGroup, type ValueSource, type VenomFlag } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';

/** Keys of `Species.sources`: one source per stored value. */
export type SpeciesSourceKey = 'name' | 'urticatingHairs' | 'venom' | 'tradeListing' | 'pullWindow' | 'pairingToSac' | 'eggs' | 'lifespan';

/** A catalogue profile. Breeding columns are null where the species has no own value (the group's applies). */
@Entity({ tableName: 'species' })
export class Species extends BaseEntity<'formerNames' | 'commonNames' | 'tradeListing' | 'sources'> {
  /** Stable key of the checked-in dataset row (e.g. "tliltocatl-vagans"), so re-seeding updates instead of duplicating. */
  @Property({ type: 'text' })
  @Unique()
  key!: string;

  @Property({ type: 'text' })
  @Unique()
  scientificName!: string;

  @Property({ type: 'text' })
  @Index()
  genus!: string;

  @Property({ type: 'text' })
  authority!: string;

  @Property({ type: 'text[]' })
  formerNames: string[] = [];

  @Property({ type: 'text[]' })
  commonNames: string[] = [];

  @Enum({ items: [...SPECIES_GROUPS], nativeEnumName: 'species_group' })
  group!: SpeciesGroup;

  @Property({ type: 'boolean' })
  urticatingHairs!: boolean;

  /** What is known about its bite (three values; docs/trade-facts.md §9). */
  @Enum({ items: [...VENOM_FLAGS] })
  venom!: VenomFlag;

  @Property({ type: 'text', nullable: true })
  tradeListing: string | null = null;

  @Property({ type: 'smallint', nullable: true })
  pullFromDay?: number | null;

  @Property({ type: 'smallint', nullable: true })
  pullToDay?: number | null;

  @Property({ type: 'smallint', nullable: true })
  pairingToSacMinDays?: number | null;

  @Property({ type: 'smallint', nullable: true })
  pairingToSacMaxDays?: number | null;

  @Property({ type: 'integer', nullable: true })
  eggsMin?: number | null;

  @Property({ type: 'integer', nullable: true })
  eggsMax?: number | null;

  @Property({ type: 'smallint', nullable: true })
  lifespanMinMonths?: number | null;

  @Property({ type: 'smallint', nullable: true })
  lifespanMaxMonths?: number | null;

  @Property({ type: 'jsonb' })
  sources: Partial<Record<SpeciesSourceKey, ValueSource>> = {};
}
