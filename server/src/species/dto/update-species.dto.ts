import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsInt, IsNotEmpty, IsOptional, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { SPECIES_GROUPS, VENOM_FLAGS, type SpeciesGroup, type UpdateSpeciesRequest, type ValueSource, type VenomFlag } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

const SOURCE_KINDS: ValueSource['kind'][] = ['published', 'common-practice', 'memory'];

/** Nullable whole number in a range: null clears the species' own value so the group default applies. */
function Count(max: number): PropertyDecorator {
  return (target, key) => {
    IsOptional()(target, key);
    ValidateIf((_, v) => v !== null)(target, key);
    IsInt({ message: `${String(key)} must be a whole number.` })(target, key);
    Min(0, { message: `${String(key)} cannot be negative.` })(target, key);
    Max(max, { message: `${String(key)} can be at most ${max}.` })(target, key);
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
  @IsIn(SPECIES_GROUPS, { message: `group must be one of ${SPECIES_GROUPS.join(', ')}.` })
  group?: SpeciesGroup;

  @IsOptionalNonNull()
  @IsBoolean()
  urticatingHairs?: boolean;

  @IsOptionalNonNull()
  @IsIn(VENOM_FLAGS, { message: `venom must be one of ${VENOM_FLAGS.join(', ')}.` })
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
  @IsIn(SOURCE_KINDS, { message: 'sourceKind must be published, common-practice or memory.' })
  sourceKind?: ValueSource['kind'];

  @IsOptionalNonNull()
  @IsString()
  @IsNotEmpty()
  @MaxLength(500)
  sourceCitation?: string;
}
