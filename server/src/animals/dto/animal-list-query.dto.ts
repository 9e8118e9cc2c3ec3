import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { ANIMAL_SEXES, ANIMAL_SORTS, ANIMAL_STATUSES, type AnimalListQuery, type AnimalSex, type AnimalSort, type AnimalStatus } from '@broodsilk/shared';
import { IsListOffset } from '../../common/validators/is-list-offset.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class AnimalListQueryDto implements AnimalListQuery {
  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number.' })
  @Min(1)
  @Max(500, { message: 'limit can be at most 500.' })
  limit?: number;

  @IsListOffset()
  offset?: number;

  @IsOptionalNonNull()
  @IsIn(ANIMAL_SORTS, { message: `sort must be one of: ${ANIMAL_SORTS.join(', ')}.` })
  sort?: AnimalSort;

  @IsOptionalNonNull()
  @IsIn(['asc', 'desc'], { message: 'order must be asc or desc.' })
  order?: 'asc' | 'desc';

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'speciesId must be a species id.' })
  speciesId?: string;

  @IsOptionalNonNull()
  @IsIn(ANIMAL_SEXES, { message: `sex must be one of: ${ANIMAL_SEXES.join(', ')}.` })
  sex?: AnimalSex;

  @IsOptionalNonNull()
  @IsIn(ANIMAL_STATUSES, { message: `status must be one of: ${ANIMAL_STATUSES.join(', ')}.` })
  status?: AnimalStatus;

  @IsOptionalNonNull()
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean({ message: 'mature must be true or false.' })
  mature?: boolean;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(100)
  q?: string;
}
