import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { SPECIES_GROUPS, type SpeciesGroup, type SpeciesListQuery } from '@broodsilk/shared';

export class SpeciesListQueryDto implements SpeciesListQuery {
  @IsOptional()
  @IsString()
  @MaxLength(100)
  q?: string;

  @IsOptional()
  @IsIn(SPECIES_GROUPS, { message: `group must be one of ${SPECIES_GROUPS.join(', ')}.` })
  group?: SpeciesGroup;

  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number.' })
  @Min(1)
  @Max(200, { message: 'limit can be at most 200.' })
  limit?: number;

  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'offset must be a whole number.' })
  @Min(0)
  offset?: number;
}
