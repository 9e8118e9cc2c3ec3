import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { ANIMAL_SEXES, ANIMAL_SORTS, ANIMAL_STATUSES, type AnimalListQuery, type AnimalSex, type AnimalSort, type AnimalStatus } from '@broodsilk/shared';

export class AnimalListQueryDto implements AnimalListQuery {
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number.' })
  @Min(1)
  @Max(500, { message: 'limit can be at most 500.' })
  limit?: number;

  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'offset must be a whole number.' })
  @Min(0)
  offset?: number;

  @IsOptional()
  @IsIn(ANIMAL_SORTS, { message: `sort must be one of: ${ANIMAL_SORTS.join(', ')}.` })
  sort?: AnimalSort;

  @IsOptional()
  @IsIn(['asc', 'desc'], { message: 'order must be asc or desc.' })
  order?: 'asc' | 'desc';

  @IsOptional()
  @IsUUID('all', { message: 'speciesId must be a species id.' })
  speciesId?: string;

  @IsOptional()
  @IsIn(ANIMAL_SEXES, { message: `sex must be one of: ${ANIMAL_SEXES.join(', ')}.` })
  sex?: AnimalSex;

  @IsOptional()
  @IsIn(ANIMAL_STATUSES, { message: `status must be one of: ${ANIMAL_STATUSES.join(', ')}.` })
  status?: AnimalStatus;

  @IsOptional()
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean({ message: 'mature must be true or false.' })
  mature?: boolean;

  @IsOptional()
  @IsString()
  @MaxLength(100)
  q?: string;
}
