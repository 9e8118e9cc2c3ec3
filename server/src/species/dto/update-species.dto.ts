import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsInt, IsNotEmpty, IsOptional, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { SPECIES_GROUPS, VENOM_FLAGS, type SpeciesGroup, type UpdateSpeciesRequest, type ValueSource, type VenomFlag } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

const SOURCE_KINDS: ValueSource['kind'][] = ['published', 'common-practice', 'memory'];

/** Nullable whole number in a range: null clears the species' own value so the group default applies. */
function Count(max: number): PropertyDecorator {
  return (target, key) => {
    IsOptional()(target, key);
    ValidateIf((_, v) => v !== null)(target, key);
    IsInt()(target, key);
    Min(0, { context: keyedBy('dto.common.notNegative', { field: String(key) }) })(target, key);
    Max(max)(target, key);
  };
}

export class UpdateSpeciesDto implements UpdateSpeciesRequest {
  @IsOptionalNonNull()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(120, { each: true })
  commonNames?: string[];

  @IsOptionalNonNull()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(120, { each: true })
  formerNames?: string[];

  @IsOptionalNonNull()
  @IsIn(SPECIES_GROUPS, { context: keyedBy('dto.species.oneOf', { field: 'group', allowed: SPECIES_GROUPS.join(', ') }) })
  group?: SpeciesGroup;

  @IsOptionalNonNull()
  @IsBoolean()
  urticatingHairs?: boolean;

  @IsOptionalNonNull()
  @IsIn(VENOM_FLAGS, { context: keyedBy('dto.species.oneOf', { field: 'venom', allowed: VENOM_FLAGS.join(', ') }) })
  venom?: VenomFlag;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(120)
  tradeListing?: string | null;

  @Count(365) pullFromDay?: number | null;
  @Count(365) pullToDay?: number | null;
  @Count(730) pairingToSacMinDays?: number | null;
  @Count(730) pairingToSacMaxDays?: number | null;
  @Count(5000) eggsMin?: number | null;
  @Count(5000) eggsMax?: number | null;
  @Count(60) lifespanMinMonths?: number | null;
  @Count(60) lifespanMaxMonths?: number | null;

  @IsOptionalNonNull()
  @IsIn(SOURCE_KINDS, { context: keyedBy('dto.species.sourceKind') })
  sourceKind?: ValueSource['kind'];

  @IsOptionalNonNull()
  @IsString()
  @IsNotEmpty()
  @MaxLength(500)
  sourceCitation?: string;
}
