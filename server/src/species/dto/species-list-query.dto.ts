import { Type } from 'class-transformer';
import { IsIn, IsInt, IsString, Max, MaxLength, Min } from 'class-validator';
import { SPECIES_GROUPS, type SpeciesGroup, type SpeciesListQuery } from '@broodsilk/shared';
import { IsListOffset } from '../../common/validators/is-list-offset.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class SpeciesListQueryDto implements SpeciesListQuery {
  @IsOptionalNonNull()
  @IsString()
  @MaxLength(100)
  q?: string;

  @IsOptionalNonNull()
  @IsIn(SPECIES_GROUPS, { context: keyedBy('dto.species.oneOf', { field: 'group', allowed: SPECIES_GROUPS.join(', ') }) })
  group?: SpeciesGroup;

  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(200)
  limit?: number;

  @IsListOffset()
  offset?: number;
}
