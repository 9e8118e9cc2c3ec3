import { ArrayMaxSize, IsArray, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { PLAUSIBILITY_WARNINGS, type AcknowledgedWarnings, type PlausibilityWarningCode, TEXT_LIMITS } from '@broodsilk/shared';
import { keyedBy } from '../common/filters/validation-exception.factory';

/** The two fields a request carries to save despite plausibility warnings; DTOs extend it. */
export class AcknowledgedWarningsDto implements AcknowledgedWarnings {
  @IsOptional()
  @IsArray({ context: keyedBy('dto.plausibility.list') })
  @ArrayMaxSize(PLAUSIBILITY_WARNINGS.length)
  @IsIn(PLAUSIBILITY_WARNINGS, { each: true, context: keyedBy('dto.plausibility.each', { allowed: PLAUSIBILITY_WARNINGS.join(', ') }) })
  acknowledgedWarnings?: PlausibilityWarningCode[];

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.warningReason, { context: keyedBy('dto.common.reasonUnder', { max: TEXT_LIMITS.warningReason }) })
  warningReason?: string;
}
