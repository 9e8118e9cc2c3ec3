import { ArrayMaxSize, IsArray, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { PLAUSIBILITY_WARNINGS, type AcknowledgedWarnings, type PlausibilityWarningCode, TEXT_LIMITS } from '@broodsilk/shared';
import { sentence } from '../common/filters/validation-exception.factory';

/** The two fields a request carries to save despite plausibility warnings; DTOs extend it. */
export class AcknowledgedWarningsDto implements AcknowledgedWarnings {
  @IsOptional()
  @IsArray(sentence('dto.plausibility.list'))
  @ArrayMaxSize(PLAUSIBILITY_WARNINGS.length)
  @IsIn(PLAUSIBILITY_WARNINGS, { each: true, ...sentence('dto.plausibility.each', { allowed: PLAUSIBILITY_WARNINGS.join(', ') }) })
  acknowledgedWarnings?: PlausibilityWarningCode[];

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.warningReason, sentence('dto.common.reasonUnder', { max: TEXT_LIMITS.warningReason }))
  warningReason?: string;
}
