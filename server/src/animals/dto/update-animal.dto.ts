import { PartialType } from '@nestjs/mapped-types';
import type { UpdateAnimalRequest } from '@broodsilk/shared';
import { CreateAnimalDto } from './create-animal.dto';

/**
 * Every field of the create form, each optional; the same checks apply to what is sent. With
 * skipNullProperties false a null is checked (and refused) like any value; only absence skips.
 */
export class UpdateAnimalDto extends PartialType(CreateAnimalDto, { skipNullProperties: false }) implements UpdateAnimalRequest {}
