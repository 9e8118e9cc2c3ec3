import { IsIn, IsOptional, IsString, MaxLength, ValidateIf } from 'class-validator';
import { ENDED_EARLY_REASONS, type EndedEarlyReason, type EndProjectRequest, TEXT_LIMITS } from '@broodsilk/shared';

export class EndProjectDto implements EndProjectRequest {
  @IsIn(ENDED_EARLY_REASONS, { message: `The reason must be one of: ${ENDED_EARLY_REASONS.join(', ')}.` })
  reason!: EndedEarlyReason;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ message: 'The note must be text.' })
  @MaxLength(TEXT_LIMITS.note, { message: `The note can be at most ${TEXT_LIMITS.note} characters.` })
  note?: string | null;

  /** Sent to the partners with the news. */
  @IsOptional()
  @IsString({ message: 'The message to the partners must be text.' })
  @MaxLength(TEXT_LIMITS.partnerMessage, { message: `The message to the partners can be at most ${TEXT_LIMITS.partnerMessage} characters.` })
  partnerMessage?: string;
}
