import { IsOptional } from 'class-validator';
import type { AnimalSex, UpdateAnimalRequest } from '@broodsilk/shared';
import { CreateAnimalDto } from './create-animal.dto';

/** Every field of the create form, each optional; the same checks apply to what is sent. */
export class UpdateAnimalDto extends CreateAnimalDto implements UpdateAnimalRequest {
  @IsOptional()
  declare speciesId: string;

  @IsOptional()
  declare label: string;

  @IsOptional()
  declare sex: AnimalSex;
}
