import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/** A provider event already handled; the primary key makes a redelivery a no-op. */
@Entity({ tableName: 'payment_events' })
export class PaymentEvent {
  @PrimaryKey({ type: 'text' })
  id!: string;

  @Property({ type: 'text' })
  type!: string;

  @Property({ type: 'timestamptz' })
  receivedAt: Date = new Date();
}
