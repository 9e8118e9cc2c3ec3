import { IsBoolean, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { CreateFeedingRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';

export class CreateFeedingDto implements CreateFeedingRequest {
  @IsCalendarDate({ message: 'The feeding date must be a date written YYYY-MM-DD.' })
  fedOn!: string;

  @IsString({ message: 'Say what prey was offered, e.g. "2 adult crickets".' })
  @IsNotEmpty({ message: 'Say what prey was offered, e.g. "2 adult crickets".' })
  @MaxLength(TEXT_LIMITS.prey, { message: `The prey is at most ${TEXT_LIMITS.prey} characters.` })
  prey!: string;

  @IsBoolean({ message: 'Say whether the prey was taken (true) or refused (false).' })
  taken!: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { message: `The note is at most ${TEXT_LIMITS.note} characters.` })
  note?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsUUID('all', { message: 'Say which entry this corrects (its id).' })
  strikes?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { message: `The reason is at most ${TEXT_LIMITS.correctionReason} characters.` })
  reason?: string | null;
}
