import { Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import { EXUVIA_SEXES, type ExuviaSex } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { Animal } from './animal.entity';

@Entity({ tableName: 'molts' })
@Index({ properties: ['animal', 'moltedOn'] })
export class Molt extends BaseEntity<'maturing'> {
  @ManyToOne(() => Animal, { deleteRule: 'cascade' })
  animal!: Animal;

  @Property({ type: 'date' })
  moltedOn!: string;

  @Enum({ items: [...EXUVIA_SEXES], nativeEnumName: 'exuvia_sex', nullable: true })
  exuviaSex?: ExuviaSex | null;

  @Property({ type: 'decimal', precision: 4, scale: 1, nullable: true })
  sizeCm?: string | null;

  @Property({ type: 'boolean' })
  maturing: boolean = false;

  @Property({ type: 'text', nullable: true })
  notes?: string | null;
}
