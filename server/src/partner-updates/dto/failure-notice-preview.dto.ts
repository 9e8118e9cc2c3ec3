import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { SAC_FAILURE_REASONS, TEXT_LIMITS, type FailureNoticePreviewRequest, type SacFailureReason } from '@broodsilk/shared';
import { sentence } from '../../common/filters/validation-exception.factory';

export class FailureNoticePreviewDto implements FailureNoticePreviewRequest {
  @IsIn(SAC_FAILURE_REASONS, sentence('dto.common.failureReasonOneOf', { allowed: SAC_FAILURE_REASONS.join(', ') }))
  failureReason!: SacFailureReason;

  @IsOptional()
  @IsString(sentence('dto.common.partnerMessageText'))
  @MaxLength(TEXT_LIMITS.partnerMessage, sentence('dto.common.partnerMessageMax', { max: TEXT_LIMITS.partnerMessage }))
  partnerMessage?: string;
}
