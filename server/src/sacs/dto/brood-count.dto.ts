import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { BROOD_LOSS_REASONS, BROOD_STAGES, type BroodCountRequest, type BroodLossReason, type BroodStage, TEXT_LIMITS } from '@broodsilk/shared';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsCount } from './opening.dto';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class BroodCountDto extends AcknowledgedWarningsDto implements BroodCountRequest {
  @IsOptionalNonNull()
  @IsInstant({ message: 'The time of the count must be a date and time with its offset, e.g. 2026-03-08T07:30:00Z.' })
  at?: string;

  @IsIn(BROOD_STAGES, { message: `The stage must be one of: ${BROOD_STAGES.join(', ')}.` })
  stage!: BroodStage;

  @IsCount('young alive') alive!: number;

  @IsOptional() @IsCount('young lost') lost?: number;

  @IsOptionalNonNull()
  @IsIn(BROOD_LOSS_REASONS, { message: `The loss reason must be one of: ${BROOD_LOSS_REASONS.join(', ')}.` })
  lossReason?: BroodLossReason;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  note?: string | null;

  @IsOptional()
  @IsBoolean({ message: 'estimated must be true or false.' })
  estimated?: boolean;

  @IsOptional()
  @IsUUID('all', { message: 'corrects must be the id of the count to correct.' })
  corrects?: string;

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { message: `Keep the reason under ${TEXT_LIMITS.correctionReason} characters.` })
  reason?: string;
}
