import { IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateIf } from 'class-validator';
import type { CreateProjectRequest } from '@broodsilk/shared';
import { AcknowledgedWarningsDto } from '../../plausibility/acknowledged-warnings.dto';

export class CreateProjectDto extends AcknowledgedWarningsDto implements CreateProjectRequest {
  @IsString({ message: 'The title must be text.' })
  @MinLength(1, { message: 'Give the project a title.' })
  @MaxLength(120, { message: 'The title can be at most 120 characters.' })
  title!: string;

  @IsUUID('all', { message: 'Choose the female from your collection.' })
  femaleId!: string;

  @IsUUID('all', { message: 'Choose the male from your collection.' })
  maleId!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString({ message: 'The notes must be text.' })
  @MaxLength(5000, { message: 'The notes can be at most 5000 characters.' })
  notes?: string | null;
}
