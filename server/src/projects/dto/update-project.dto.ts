import { IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { UpdateProjectRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

/** Title and notes only: the animals of a project never change (start a new project instead). */
export class UpdateProjectDto implements UpdateProjectRequest {
  @IsOptionalNonNull()
  @IsString({ context: keyedBy('dto.project.titleText') })
  @MinLength(1, { context: keyedBy('dto.project.titleNeeded') })
  @MaxLength(TEXT_LIMITS.projectTitle, { context: keyedBy('dto.project.titleMax', { max: TEXT_LIMITS.projectTitle }) })
  title?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ context: keyedBy('dto.common.notesText') })
  @MaxLength(TEXT_LIMITS.projectNotes, { context: keyedBy('dto.common.notesMax', { max: TEXT_LIMITS.projectNotes }) })
  notes?: string | null;
}
