import { Type } from 'class-transformer';
import { IsBoolean, IsInt, IsOptional, Max, Min, ValidateIf, ValidateNested, registerDecorator } from 'class-validator';
import { NOTIFICATION_KINDS, REMINDER_CHANNELS, type NotificationKind, type ReminderChannel, type UpdateReminderPreferencesRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

const HOUR_MESSAGE = 'An hour must be a whole hour from 0 to 23.';
const hour = () => [IsInt({ message: HOUR_MESSAGE }), Min(0, { message: HOUR_MESSAGE }), Max(23, { message: HOUR_MESSAGE })];
const apply =
  (decorators: PropertyDecorator[]): PropertyDecorator =>
  (target, key) =>
    decorators.forEach((d) => d(target, key));

/** `{ kind: channel }` with known kinds and channels only; the message lists what is allowed. */
function IsChannelChoices(): PropertyDecorator {
  return (object, propertyName) =>
    registerDecorator({
      name: 'isChannelChoices',
      target: object.constructor,
      propertyName: String(propertyName),
      validator: {
        validate: (value: unknown) =>
          typeof value === 'object' &&
          value !== null &&
          !Array.isArray(value) &&
          Object.entries(value).every(
            ([k, v]) => (NOTIFICATION_KINDS as readonly string[]).includes(k) && (REMINDER_CHANNELS as readonly unknown[]).includes(v),
          ),
        defaultMessage: () => `Each reminder kind must be one of ${NOTIFICATION_KINDS.join(', ')}, and each channel one of ${REMINDER_CHANNELS.join(', ')}.`,
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
  @IsBoolean({ message: 'overdueBreaksQuiet must be true or false.' })
  overdueBreaksQuiet?: boolean;

  /** Null turns the digest off. */
  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @apply(hour())
  digestHour?: number | null;
}
