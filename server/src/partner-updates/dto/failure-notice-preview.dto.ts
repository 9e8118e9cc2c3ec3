import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { SAC_FAILURE_REASONS, TEXT_LIMITS, type FailureNoticePreviewRequest, type SacFailureReason } from '@broodsilk/shared';

export class FailureNoticePreviewDto implements FailureNoticePreviewRequest {
  @IsIn(SAC_FAILURE_REASONS, { message: `The failure reason must be one of: ${SAC_FAILURE_REASONS.join(', ')}.` })
  failureReason!: SacFailureReason;

  @IsOptional()
  @IsString({ message: 'The message to the partners must be text.' })
  @MaxLength(TEXT_LIMITS.partnerMessage, { message: `The message to the partners can be at most ${TEXT_LIMITS.partnerMessage} characters.` })
  partnerMessage?: string;
}
