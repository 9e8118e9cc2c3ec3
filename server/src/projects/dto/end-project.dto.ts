import { IsIn, IsOptional, IsString, MaxLength, ValidateIf } from 'class-validator';
import { ENDED_EARLY_REASONS, type EndedEarlyReason, type EndProjectRequest, TEXT_LIMITS } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class EndProjectDto implements EndProjectRequest {
  @IsIn(ENDED_EARLY_REASONS, { context: keyedBy('dto.project.endReason', { allowed: ENDED_EARLY_REASONS.join(', ') }) })
  reason!: EndedEarlyReason;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ context: keyedBy('dto.project.noteText') })
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.common.noteMax', { max: TEXT_LIMITS.note }) })
  note?: string | null;

  /** Sent to the partners with the news. */
  @IsOptional()
  @IsString({ context: keyedBy('dto.common.partnerMessageText') })
  @MaxLength(TEXT_LIMITS.partnerMessage, { context: keyedBy('dto.common.partnerMessageMax', { max: TEXT_LIMITS.partnerMessage }) })
  partnerMessage?: string;
}
