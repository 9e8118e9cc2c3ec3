import { IsIn, IsOptional, IsString, MaxLength, ValidateIf } from 'class-validator';
import { SAC_FAILURE_REASONS, SAC_OUTCOMES, TEXT_LIMITS, type SacFailureReason, type SacOutcomeState, type UpdateSacRequest } from '@broodsilk/shared';
import { PartialType } from '@nestjs/mapped-types';
import { CreateSacDto } from './create-sac.dto';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

/** Every create field, each optional (same checks), plus the outcome. */
export class UpdateSacDto extends PartialType(CreateSacDto, { skipNullProperties: false }) implements UpdateSacRequest {
  @IsOptionalNonNull()
  @IsIn(SAC_OUTCOMES, { context: keyedBy('dto.common.outcomeOneOf', { allowed: SAC_OUTCOMES.join(', ') }) })
  outcome?: SacOutcomeState;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsIn(SAC_FAILURE_REASONS, { context: keyedBy('dto.common.failureReasonOneOf', { allowed: SAC_FAILURE_REASONS.join(', ') }) })
  failureReason?: SacFailureReason | null;

  /** Sent to the partners with the failure (only with the outcome `failed`). */
  @IsOptionalNonNull()
  @IsString({ context: keyedBy('dto.common.partnerMessageText') })
  @MaxLength(TEXT_LIMITS.partnerMessage, { context: keyedBy('dto.common.partnerMessageMax', { max: TEXT_LIMITS.partnerMessage }) })
  partnerMessage?: string;
}
