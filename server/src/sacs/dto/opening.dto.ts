import { IsBoolean, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { BROOD_COUNT_MAX, type ServerCatalogue, type OpeningRequest, TEXT_LIMITS } from '@broodsilk/shared';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { keyedBy } from '../../common/filters/validation-exception.factory';

/** A count is a whole number from 0 to BROOD_COUNT_MAX; `what` names its sentence. */
export function IsCount(what: keyof ServerCatalogue['refusal']['dto']['count']): PropertyDecorator {
  const said = { context: keyedBy(`dto.count.${what}`, { max: BROOD_COUNT_MAX }) };
  return (target, key) => {
    IsInt(said)(target, key);
    Min(0, said)(target, key);
    Max(BROOD_COUNT_MAX, said)(target, key);
  };
}

export class OpeningDto extends AcknowledgedWarningsDto implements OpeningRequest {
  @IsOptionalNonNull()
  @IsInstant({ context: keyedBy('dto.opening.at') })
  openedAt?: string;

  @IsCount('healthyEggs') healthyEggs!: number;
  @IsCount('eggsWithLegs') eggsWithLegs!: number;
  @IsCount('nymphs') nymphs!: number;
  @IsCount('darkEggs') darkEggs!: number;
  @IsCount('spoiledEggs') spoiledEggs!: number;
  @IsCount('keptBack') keptBack!: number;

  @IsOptional()
  @IsBoolean()
  estimated?: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  notes?: string | null;

  @IsOptional()
  @IsUUID('all', { context: keyedBy('dto.opening.correctsId') })
  corrects?: string;

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { context: keyedBy('dto.common.reasonUnder', { max: TEXT_LIMITS.correctionReason }) })
  reason?: string;
}
