import { IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { UpdateProjectRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

/** Title and notes only: the animals of a project never change (start a new project instead). */
export class UpdateProjectDto implements UpdateProjectRequest {
  @IsOptionalNonNull()
  @IsString({ message: 'The title must be text.' })
  @MinLength(1, { message: 'Give the project a title.' })
  @MaxLength(TEXT_LIMITS.projectTitle, { message: `The title can be at most ${TEXT_LIMITS.projectTitle} characters.` })
  title?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ message: 'The notes must be text.' })
  @MaxLength(TEXT_LIMITS.projectNotes, { message: `The notes can be at most ${TEXT_LIMITS.projectNotes} characters.` })
  notes?: string | null;
}
