import { Type } from 'class-transformer';
import { IsBoolean, IsInt, IsOptional, Max, Min, ValidateIf, ValidateNested, registerDecorator } from 'class-validator';
import { NOTIFICATION_KINDS, REMINDER_CHANNELS, type NotificationKind, type ReminderChannel, type UpdateReminderPreferencesRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';
import { refusal } from '../../common/refusal';

const HOUR = { context: keyedBy('dto.reminder.hour') };
const hour = () => [IsInt(HOUR), Min(0, HOUR), Max(23, HOUR)];
const apply =
  (decorators: PropertyDecorator[]): PropertyDecorator =>
  (target, key) =>
    decorators.forEach((d) => d(target, key));

const CHANNELS = 'dto.reminder.channels';
const CHOICES = { kinds: NOTIFICATION_KINDS.join(', '), channels: REMINDER_CHANNELS.join(', ') };

/** `{ kind: channel }` with known kinds and channels only; the message lists what is allowed. */
function IsChannelChoices(): PropertyDecorator {
  return (object, propertyName) =>
    registerDecorator({
      name: 'isChannelChoices',
      target: object.constructor,
      propertyName: String(propertyName),
      options: { context: keyedBy(CHANNELS, CHOICES) },
      validator: {
        validate: (value: unknown) =>
          typeof value === 'object' &&
          value !== null &&
          !Array.isArray(value) &&
          Object.entries(value).every(
            ([k, v]) => (NOTIFICATION_KINDS as readonly string[]).includes(k) && (REMINDER_CHANNELS as readonly unknown[]).includes(v),
          ),
        // class-validator hands the context on only with a message, so the English is given too.
        defaultMessage: () => refusal(CHANNELS, CHOICES).message,
      },
    });
}

export class QuietHoursDto {
  @apply(hour())
  from!: number;

  @apply(hour())
  to!: number;
}

export class UpdateReminderPreferencesDto implements UpdateReminderPreferencesRequest {
  @IsOptionalNonNull()
  @IsChannelChoices()
  channels?: Partial<Record<NotificationKind, ReminderChannel>>;

  /** Null turns quiet hours off. */
  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @ValidateNested()
  @Type(() => QuietHoursDto)
  quietHours?: QuietHoursDto | null;

  @IsOptionalNonNull()
  @IsBoolean()
  overdueBreaksQuiet?: boolean;

  /** Null turns the digest off. */
  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @apply(hour())
  digestHour?: number | null;
}
