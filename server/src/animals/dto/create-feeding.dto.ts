import { IsBoolean, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { CreateFeedingRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class CreateFeedingDto implements CreateFeedingRequest {
  @IsCalendarDate({ context: keyedBy('dto.feeding.fedOn') })
  fedOn!: string;

  @IsString({ context: keyedBy('feeding.preyNeeded') })
  @IsNotEmpty({ context: keyedBy('feeding.preyNeeded') })
  @MaxLength(TEXT_LIMITS.prey, { context: keyedBy('dto.feeding.preyMax', { max: TEXT_LIMITS.prey }) })
  prey!: string;

  @IsBoolean({ context: keyedBy('dto.feeding.taken') })
  taken!: boolean;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.feeding.noteMax', { max: TEXT_LIMITS.note }) })
  note?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsUUID('all', { context: keyedBy('careLog.strikeWhich') })
  strikes?: string | null;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.correctionReason, { context: keyedBy('dto.feeding.reasonMax', { max: TEXT_LIMITS.correctionReason }) })
  reason?: string | null;
}
