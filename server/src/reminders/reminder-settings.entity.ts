import { Entity, OneToOne, Property } from '@mikro-orm/core';
import type { NotificationKind, ReminderChannel } from '@broodsilk/shared';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/** A user's reminder choices; a user without a row gets every kind by e-mail and in-app, no quiet hours, no digest. */
@Entity({ tableName: 'reminder_settings' })
export class ReminderSettings extends BaseEntity<'channels' | 'overdueBreaksQuiet'> {
  @OneToOne(() => User, { owner: true, deleteRule: 'cascade', unique: 'reminder_settings_user_unique' })
  user!: User;

  /** Only the kinds the user changed from the default. */
  @Property({ type: 'jsonb' })
  channels: Partial<Record<NotificationKind, ReminderChannel>> = {};

  @Property({ type: 'smallint', nullable: true })
  quietFrom?: number | null;

  @Property({ type: 'smallint', nullable: true })
  quietTo?: number | null;

  @Property({ type: 'boolean' })
  overdueBreaksQuiet: boolean = false;

  @Property({ type: 'smallint', nullable: true })
  digestHour?: number | null;
}
