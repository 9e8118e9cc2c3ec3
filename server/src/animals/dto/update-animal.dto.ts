import { PartialType } from '@nestjs/mapped-types';
import type { UpdateAnimalRequest } from '@broodsilk/shared';
import { CreateAnimalDto } from './create-animal.dto';

/** Every field of the create form, each optional; the same checks apply to what is sent. */
export class UpdateAnimalDto extends PartialType(CreateAnimalDto) implements UpdateAnimalRequest {}
