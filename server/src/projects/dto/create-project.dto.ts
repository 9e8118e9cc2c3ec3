import { IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { TEXT_LIMITS } from '@broodsilk/shared';
import type { CreateProjectRequest } from '@broodsilk/shared';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';

export class CreateProjectDto extends AcknowledgedWarningsDto implements CreateProjectRequest {
  @IsString({ message: 'The title must be text.' })
  @MinLength(1, { message: 'Give the project a title.' })
  @MaxLength(TEXT_LIMITS.projectTitle, { message: `The title can be at most ${TEXT_LIMITS.projectTitle} characters.` })
  title!: string;

  @IsUUID('all', { message: 'Choose the female from your collection.' })
  femaleId!: string;

  @IsUUID('all', { message: 'Choose the male from your collection.' })
  maleId!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ message: 'The notes must be text.' })
  @MaxLength(TEXT_LIMITS.projectNotes, { message: `The notes can be at most ${TEXT_LIMITS.projectNotes} characters.` })
  notes?: string | null;
}
