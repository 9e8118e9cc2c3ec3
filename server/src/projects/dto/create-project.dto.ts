import { IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { CreateProjectRequest } from '@broodsilk/shared';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { sentence } from '../../common/filters/validation-exception.factory';

export class CreateProjectDto extends AcknowledgedWarningsDto implements CreateProjectRequest {
  @IsString(sentence('dto.project.titleText'))
  @MinLength(1, sentence('dto.project.titleNeeded'))
  @MaxLength(TEXT_LIMITS.projectTitle, sentence('dto.project.titleMax', { max: TEXT_LIMITS.projectTitle }))
  title!: string;

  @IsUUID('all', sentence('dto.project.female'))
  femaleId!: string;

  @IsUUID('all', sentence('dto.project.male'))
  maleId!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString(sentence('dto.common.notesText'))
  @MaxLength(TEXT_LIMITS.projectNotes, sentence('dto.common.notesMax', { max: TEXT_LIMITS.projectNotes }))
  notes?: string | null;
}
