import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { SAC_FAILURE_REASONS, TEXT_LIMITS, type FailureNoticePreviewRequest, type SacFailureReason } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class FailureNoticePreviewDto implements FailureNoticePreviewRequest {
  @IsIn(SAC_FAILURE_REASONS, { context: keyedBy('dto.common.failureReasonOneOf', { allowed: SAC_FAILURE_REASONS.join(', ') }) })
  failureReason!: SacFailureReason;

  @IsOptional()
  @IsString({ context: keyedBy('dto.common.partnerMessageText') })
  @MaxLength(TEXT_LIMITS.partnerMessage, { context: keyedBy('dto.common.partnerMessageMax', { max: TEXT_LIMITS.partnerMessage }) })
  partnerMessage?: string;
}
