import type { AnimalSex, UpdateAnimalRequest } from '@broodsilk/shared';
import { CreateAnimalDto } from './create-animal.dto';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

/** Every field of the create form, each optional; the same checks apply to what is sent. */
export class UpdateAnimalDto extends CreateAnimalDto implements UpdateAnimalRequest {
  @IsOptionalNonNull()
  declare speciesId: string;

  @IsOptionalNonNull()
  declare label: string;

  @IsOptionalNonNull()
  declare sex: AnimalSex;
}
