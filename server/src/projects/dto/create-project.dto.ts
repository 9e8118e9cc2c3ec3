import { IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { CreateProjectRequest } from '@broodsilk/shared';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class CreateProjectDto extends AcknowledgedWarningsDto implements CreateProjectRequest {
  @IsString({ context: keyedBy('dto.project.titleText') })
  @MinLength(1, { context: keyedBy('dto.project.titleNeeded') })
  @MaxLength(TEXT_LIMITS.projectTitle, { context: keyedBy('dto.project.titleMax', { max: TEXT_LIMITS.projectTitle }) })
  title!: string;

  @IsUUID('all', { context: keyedBy('dto.project.female') })
  femaleId!: string;

  @IsUUID('all', { context: keyedBy('dto.project.male') })
  maleId!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ context: keyedBy('dto.common.notesText') })
  @MaxLength(TEXT_LIMITS.projectNotes, { context: keyedBy('dto.common.notesMax', { max: TEXT_LIMITS.projectNotes }) })
  notes?: string | null;
}
