import { IsBoolean, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import type { CreateFeedingRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';

export class CreateFeedingDto implements CreateFeedingRequest {
  @IsCalendarDate({ message: 'The feeding date must be a date written YYYY-MM-DD.' })
  fedOn!: string;

  @IsString({ message: 'Say what prey was offered, e.g. "2 adult crickets".' })
  @IsNotEmpty({ message: 'Say what prey was offered, e.g. "2 adult crickets".' })
  @MaxLength(200, { message: 'The prey is at most 200 characters.' })
  prey!: string;

  @IsBoolean({ message: 'Say whether the prey was taken (true) or refused (false).' })
  taken!: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(2000, { message: 'The note is at most 2000 characters.' })
  note?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsUUID('all', { message: 'Say which entry this corrects (its id).' })
  strikes?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(500, { message: 'The reason is at most 500 characters.' })
  reason?: string | null;
}
