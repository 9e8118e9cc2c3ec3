import { ArrayMaxSize, IsArray, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { PLAUSIBILITY_WARNINGS, type AcknowledgedWarnings, type PlausibilityWarningCode, TEXT_LIMITS } from '@broodsilk/shared';

/** The two fields a request carries to save despite plausibility warnings; DTOs extend it. */
export class AcknowledgedWarningsDto implements AcknowledgedWarnings {
  @IsOptional()
  @IsArray({ message: 'acknowledgedWarnings must be a list of warning codes.' })
  @ArrayMaxSize(PLAUSIBILITY_WARNINGS.length)
  @IsIn(PLAUSIBILITY_WARNINGS, { each: true, message: `Each acknowledged warning must be one of: ${PLAUSIBILITY_WARNINGS.join(', ')}.` })
  acknowledgedWarnings?: PlausibilityWarningCode[];

  @IsOptional()
  @IsString()
  @MaxLength(TEXT_LIMITS.warningReason, { message: `Keep the reason under ${TEXT_LIMITS.warningReason} characters.` })
  warningReason?: string;
}
