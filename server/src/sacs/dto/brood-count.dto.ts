import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { BROOD_LOSS_REASONS, BROOD_STAGES, type BroodCountRequest, type BroodLossReason, type BroodStage, TEXT_LIMITS } from '@broodsilk/shared';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { IsInstant } from '../../common/validators/is-instant.validator';
import { IsCount } from './opening.dto';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class BroodCountDto extends AcknowledgedWarningsDto implements BroodCountRequest {
  @IsOptionalNonNull()
  @IsInstant({ context: keyedBy('dto.broodCount.at') })
  at?: string;

  @IsIn(BROOD_STAGES, { context: keyedBy('dto.common.stageOneOf', { allowed: BROOD_STAGES.join(', ') }) })
  stage!: BroodStage;

  @IsCount('alive') alive!: number;

  @IsOptional() @IsCount('lost') lost?: number;

  @IsOptionalNonNull()
  @IsIn(BROOD_LOSS_REASONS, { context: keyedBy('dto.broodCount.lossReason', { allowed: BROOD_LOSS_REASONS.join(', ') }) })
  lossReason?: BroodLossReason;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note)
  note?: string | null;

  @IsOptional()
  @IsBoolean()
  estimated?: boolean;

  @IsOptional()
  @IsUUID('all', { context: keyedBy('dto.broodCount.correctsId') })
  corrects?: string;

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { context: keyedBy('dto.common.reasonUnder', { max: TEXT_LIMITS.correctionReason }) })
  reason?: string;
}
