import { IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import type { UpdateProjectRequest } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

/** Title and notes only: the animals of a project never change (start a new project instead). */
export class UpdateProjectDto implements UpdateProjectRequest {
  @IsOptionalNonNull()
  @IsString({ message: 'The title must be text.' })
  @MinLength(1, { message: 'Give the project a title.' })
  @MaxLength(120, { message: 'The title can be at most 120 characters.' })
  title?: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ message: 'The notes must be text.' })
  @MaxLength(5000, { message: 'The notes can be at most 5000 characters.' })
  notes?: string | null;
}
