import { Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { DEFAULT_REMINDER_CHANNEL, NOTIFICATION_KINDS, type NotificationKind, type ReminderChannel, type ReminderPreferences } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { User } from '../users/user.entity';
import { ReminderSettings } from './reminder-settings.entity';
import type { UpdateReminderPreferencesDto } from './dto/update-reminder-preferences.dto';
import { refusal } from '../common/refusal';

export function toReminderPreferences(user: User, s: ReminderSettings | null): ReminderPreferences {
  const channels = Object.fromEntries(NOTIFICATION_KINDS.map((k) => [k, s?.channels[k] ?? DEFAULT_REMINDER_CHANNEL])) as Record<
    NotificationKind,
    ReminderChannel
  >;
  return {
    channels,
    quietHours: s?.quietFrom != null && s.quietTo != null ? { from: s.quietFrom, to: s.quietTo } : null,
    overdueBreaksQuiet: s?.overdueBreaksQuiet ?? false,
    digestHour: s?.digestHour ?? null,
    timeZone: user.timeZone,
  };
}

/** One's own reminder choices; a change re-plans one's reminders (the planner follows the settings row). */
@Injectable()
export class ReminderPreferencesService {
  constructor(private readonly em: EntityManager) {}

  async get(viewer: AuthUser): Promise<ReminderPreferences> {
    const user = await this.em.findOneOrFail(User, viewer.id);
    return toReminderPreferences(user, await this.em.findOne(ReminderSettings, { user: viewer.id }));
  }

  async update(viewer: AuthUser, dto: UpdateReminderPreferencesDto): Promise<ReminderPreferences> {
    return this.em.transactional(async (tx) => {
      const user = await tx.findOneOrFail(User, viewer.id);
      const s = (await tx.findOne(ReminderSettings, { user: viewer.id })) ?? tx.create(ReminderSettings, { user });
      this.changeChannels(s, dto.channels);
      if (dto.quietHours !== undefined) {
        s.quietFrom = dto.quietHours?.from ?? null;
        s.quietTo = dto.quietHours?.to ?? null;
      }
      if (dto.overdueBreaksQuiet !== undefined) s.overdueBreaksQuiet = dto.overdueBreaksQuiet;
      if (dto.digestHour !== undefined) s.digestHour = dto.digestHour;
      await tx.flush();
      return toReminderPreferences(user, s);
    });
  }

  /** Stops e-mails of one kind (an unsubscribe link): both → in-app, e-mail → off. */
  async stopEmails(userId: string, kind: NotificationKind): Promise<void> {
    await this.em.transactional(async (tx) => {
      const user = await tx.findOne(User, userId);
      if (!user) throw new NotFoundException(refusal('reminder.accountGone'));
      const s = (await tx.findOne(ReminderSettings, { user: userId })) ?? tx.create(ReminderSettings, { user });
      const now = s.channels[kind] ?? DEFAULT_REMINDER_CHANNEL;
      const next: ReminderChannel = now === 'both' ? 'in-app' : now === 'email' ? 'off' : now;
      this.changeChannels(s, { [kind]: next });
      await tx.flush();
    });
  }

  private changeChannels(s: ReminderSettings, change: Partial<Record<NotificationKind, ReminderChannel>> | undefined): void {
    // A new object, so the ORM sees the jsonb change.
    if (change) s.channels = { ...s.channels, ...change };
  }
}
