import { IsIn, IsOptional, IsString, MaxLength, ValidateIf } from 'class-validator';
import { SAC_FAILURE_REASONS, SAC_OUTCOMES, TEXT_LIMITS, type SacFailureReason, type SacOutcomeState, type UpdateSacRequest } from '@broodsilk/shared';
import { PartialType } from '@nestjs/mapped-types';
import { CreateSacDto } from './create-sac.dto';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

/** Every create field, each optional (same checks), plus the outcome. */
export class UpdateSacDto extends PartialType(CreateSacDto, { skipNullProperties: false }) implements UpdateSacRequest {
  @IsOptionalNonNull()
  @IsIn(SAC_OUTCOMES, { message: `The outcome must be one of: ${SAC_OUTCOMES.join(', ')}.` })
  outcome?: SacOutcomeState;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsIn(SAC_FAILURE_REASONS, { message: `The failure reason must be one of: ${SAC_FAILURE_REASONS.join(', ')}.` })
  failureReason?: SacFailureReason | null;

  /** Sent to the partners with the failure (only with the outcome `failed`). */
  @IsOptionalNonNull()
  @IsString({ message: 'The message to the partners must be text.' })
  @MaxLength(TEXT_LIMITS.partnerMessage, { message: `The message to the partners can be at most ${TEXT_LIMITS.partnerMessage} characters.` })
  partnerMessage?: string;
}
