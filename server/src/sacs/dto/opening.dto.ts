import { IsBoolean, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { BROOD_COUNT_MAX, type OpeningRequest } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';

/** A count is a whole number from 0 to BROOD_COUNT_MAX. */
export function IsCount(what: string): PropertyDecorator {
  const message = `The number of ${what} must be a whole number from 0 to ${BROOD_COUNT_MAX}.`;
  return (target, key) => {
    IsInt({ message })(target, key);
    Min(0, { message })(target, key);
    Max(BROOD_COUNT_MAX, { message })(target, key);
  };
}

export class OpeningDto extends AcknowledgedWarningsDto implements OpeningRequest {
  @IsOptionalNonNull()
  @IsInstant({ message: 'The opening time must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.' })
  openedAt?: string;

  @IsCount('healthy eggs') healthyEggs!: number;
  @IsCount('eggs with legs') eggsWithLegs!: number;
  @IsCount('nymphs') nymphs!: number;
  @IsCount('dark eggs') darkEggs!: number;
  @IsCount('spoiled eggs') spoiledEggs!: number;
  @IsCount('kept-back eggs') keptBack!: number;

  @IsOptional()
  @IsBoolean({ message: 'estimated must be true or false.' })
  estimated?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(2000)
  notes?: string | null;

  @IsOptional()
  @IsUUID('all', { message: 'corrects must be the id of the opening to correct.' })
  corrects?: string;

  @IsOptional()
  @IsString()
  @MaxLength(500, { message: 'Keep the reason under 500 characters.' })
  reason?: string;
}
