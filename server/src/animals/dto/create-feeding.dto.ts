import { IsBoolean, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { CreateFeedingRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { sentence } from '../../common/filters/validation-exception.factory';

export class CreateFeedingDto implements CreateFeedingRequest {
  @IsCalendarDate(sentence('dto.feeding.fedOn'))
  fedOn!: string;

  @IsString(sentence('feeding.preyNeeded'))
  @IsNotEmpty(sentence('feeding.preyNeeded'))
  @MaxLength(TEXT_LIMITS.prey, sentence('dto.feeding.preyMax', { max: TEXT_LIMITS.prey }))
  prey!: string;

  @IsBoolean(sentence('dto.feeding.taken'))
  taken!: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, sentence('dto.feeding.noteMax', { max: TEXT_LIMITS.note }))
  note?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsUUID('all', sentence('careLog.strikeWhich'))
  strikes?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, sentence('dto.feeding.reasonMax', { max: TEXT_LIMITS.correctionReason }))
  reason?: string | null;
}
