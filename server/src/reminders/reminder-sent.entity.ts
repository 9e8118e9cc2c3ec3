import { Entity, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';

/** One row per reminder sent: the unique key (thing, person, day) makes "once per thing per day" hold across job runs and processes. */
@Entity({ tableName: 'reminder_sent' })
export class ReminderSent extends BaseEntity {
  @Property({ type: 'text' })
  @Unique({ name: 'reminder_sent_key_unique' })
  key!: string;
}
