import { Check, Entity, Enum, Index, ManyToOne, Property } from '@mikro-orm/core';
import type { HandOverMethod } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { User } from '../users/user.entity';

export const LEDGER_ROW_KINDS = ['hand-over', 'arrival', 'sale', 'cash-out', 'money', 'correction', 'confirmation'] as const;
export type LedgerRowKind = (typeof LEDGER_ROW_KINDS)[number];

/**
 * One row of a project's account. Append-only: a database trigger refuses UPDATE and DELETE,
 * and no code path changes a row; a mistake is undone by a `correction` row.
 */
@Entity({ tableName: 'ledger_entries' })
@Index({ properties: ['project', 'seq'] })
@Check({
  name: 'ledger_entries_counts_check',
  expression:
    'coalesce("count", 1) > 0 and coalesce("amount_minor", 1) > 0 and coalesce("price_minor", 0) >= 0 and coalesce("arrived_alive", 0) >= 0 and coalesce("arrived_dead", 0) >= 0',
})
export class LedgerEntryRow extends BaseEntity<'source'> {
  @ManyToOne(() => Project, { deleteRule: 'cascade' })
  project!: Project;

  /** Ledger order, from the `ledger_entry_seq` sequence (global, so no two writers ever collide). */
  @Property({ type: 'integer', unique: true })
  seq!: number;

  @Enum({ items: [...LEDGER_ROW_KINDS], nativeEnumName: 'ledger_entry_kind' })
  kind!: LedgerRowKind;

  @Property({ type: 'date' })
  date!: string;

  /** The sac the young came from (hand-over, sale, cash-out). Sacs are the sacs module's; no FK here. */
  @Property({ type: 'uuid', nullable: true })
  sacId?: string | null;

  @ManyToOne(() => ProjectMember, { nullable: true, deleteRule: 'no action' })
  party?: ProjectMember | null;

  @ManyToOne(() => ProjectMember, { nullable: true, deleteRule: 'no action' })
  fromParty?: ProjectMember | null;

  @ManyToOne(() => ProjectMember, { nullable: true, deleteRule: 'no action' })
  toParty?: ProjectMember | null;

  @Property({ type: 'integer', nullable: true })
  count?: number | null;

  @Enum({ items: ['pick-up', 'shipment'], nativeEnumName: 'hand_over_method', nullable: true })
  method?: HandOverMethod | null;

  @Property({ type: 'text', nullable: true })
  carrier?: string | null;

  @Property({ type: 'text', nullable: true })
  tracking?: string | null;

  @Property({ type: 'integer', nullable: true })
  priceMinor?: number | null;

  @Property({ type: 'integer', nullable: true })
  pricePerSpiderlingMinor?: number | null;

  @Property({ type: 'integer', nullable: true })
  amountMinor?: number | null;

  @Property({ type: 'string', columnType: 'char(3)', nullable: true })
  currency?: string | null;

  /** Arrival: the hand-over it counts. Correction: the entry it reverses. Confirmation: the money entry. */
  @ManyToOne(() => LedgerEntryRow, { nullable: true, deleteRule: 'no action' })
  target?: LedgerEntryRow | null;

  @Property({ type: 'integer', nullable: true })
  arrivedAlive?: number | null;

  @Property({ type: 'integer', nullable: true })
  arrivedDead?: number | null;

  @Property({ type: 'text', nullable: true })
  reason?: string | null;

  @Property({ type: 'text', nullable: true })
  note?: string | null;

  @Enum({ items: ['manual', 'payment-provider'], nativeEnumName: 'ledger_entry_source' })
  source: 'manual' | 'payment-provider' = 'manual';

  /** The provider's payment (checkout session) id; unique so one payment is one entry. */
  @Property({ type: 'text', nullable: true, unique: true })
  providerRef?: string | null;

  /** Null when the system recorded it (a provider payment). */
  @ManyToOne(() => User, { nullable: true, deleteRule: 'restrict' })
  recordedBy?: User | null;
}

/** The values a row carries besides its kind, date and references (which of them depends on the kind). */
export type LedgerRowValues = Pick<
  LedgerEntryRow,
  | 'sacId'
  | 'count'
  | 'method'
  | 'carrier'
  | 'tracking'
  | 'priceMinor'
  | 'pricePerSpiderlingMinor'
  | 'amountMinor'
  | 'currency'
  | 'arrivedAlive'
  | 'arrivedDead'
  | 'reason'
  | 'note'
>;
