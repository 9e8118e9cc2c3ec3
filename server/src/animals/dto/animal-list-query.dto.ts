import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { ANIMAL_SEXES, ANIMAL_SORTS, ANIMAL_STATUSES, type AnimalListQuery, type AnimalSex, type AnimalSort, type AnimalStatus } from '@broodsilk/shared';
import { IsListOffset } from '../../common/validators/is-list-offset.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class AnimalListQueryDto implements AnimalListQuery {
  @IsOptionalNonNull()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(500)
  limit?: number;

  @IsListOffset()
  offset?: number;

  @IsOptionalNonNull()
  @IsIn(ANIMAL_SORTS)
  sort?: AnimalSort;

  @IsOptionalNonNull()
  @IsIn(['asc', 'desc'], { context: keyedBy('dto.animal.order') })
  order?: 'asc' | 'desc';

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.animal.speciesId') })
  speciesId?: string;

  @IsOptionalNonNull()
  @IsIn(ANIMAL_SEXES)
  sex?: AnimalSex;

  @IsOptionalNonNull()
  @IsIn(ANIMAL_STATUSES)
  status?: AnimalStatus;

  @IsOptionalNonNull()
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean()
  mature?: boolean;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(100)
  q?: string;
}
