import { Type } from 'class-transformer';
import { IsIn, IsInt, IsString, Max, MaxLength, Min } from 'class-validator';
import { SPECIES_GROUPS, type SpeciesGroup, type SpeciesListQuery } from '@broodsilk/shared';
import { IsListOffset } from '../../common/validators/is-list-offset.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class SpeciesListQueryDto implements SpeciesListQuery {
  @IsOptionalNonNull()
  @IsString()
  @MaxLength(100)
  q?: string;

  @IsOptionalNonNull()
  @IsIn(SPECIES_GROUPS, { message: `group must be one of ${SPECIES_GROUPS.join(', ')}.` })
  group?: SpeciesGroup;

  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number.' })
  @Min(1)
  @Max(200, { message: 'limit can be at most 200.' })
  limit?: number;

  @IsListOffset()
  offset?: number;
}
