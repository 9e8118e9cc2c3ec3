import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsInt, IsNotEmpty, IsString, IsUUID, Matches, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import {
  ANIMAL_SEXES,
  ANIMAL_STATUSES,
  CUSTODIES,
  MATURITIES,
  OWNER_KINDS,
  type AnimalSex,
  type AnimalStatus,
  type CreateAnimalRequest,
  type Custody,
  type Maturity,
  type OwnerKind,
  TEXT_LIMITS,
} from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
/** Blank text means "none": a form's empty box and a CSV's empty cell both arrive as "". */
const blankToNull = ({ value }: { value: unknown }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim()) : value);
const notNull = (_: object, v: unknown) => v !== null && v !== undefined;

/** The create form and every CSV row are checked by this class. */
export class CreateAnimalDto implements CreateAnimalRequest {
  @IsUUID('all', { context: keyedBy('species.choose') })
  speciesId!: string;

  @Transform(trim)
  @IsString()
  @IsNotEmpty({ context: keyedBy('dto.animal.labelNeeded') })
  @MaxLength(TEXT_LIMITS.animalLabel, { context: keyedBy('dto.animal.labelMax', { max: TEXT_LIMITS.animalLabel }) })
  label!: string;

  @IsIn(ANIMAL_SEXES)
  sex!: AnimalSex;

  @IsOptionalNonNull()
  @IsIn(MATURITIES)
  maturity?: Maturity;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ context: keyedBy('dto.animal.maturedOn') })
  maturedOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ context: keyedBy('dto.animal.acquiredOn') })
  acquiredOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.acquiredFrom)
  acquiredFrom?: string | null;

  @Transform(({ value }) => (value === '' ? null : typeof value === 'string' && /^-?\d+$/.test(value.trim()) ? Number(value) : value))
  @ValidateIf(notNull)
  @IsInt({ context: keyedBy('dto.animal.priceWhole') })
  @Min(0, { context: keyedBy('dto.animal.priceNegative') })
  @Max(100_000_000, { context: keyedBy('dto.animal.priceTooLarge') })
  pricePaidMinor?: number | null;

  @Transform(({ value }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim().toUpperCase()) : value))
  @ValidateIf(notNull)
  @Matches(/^[A-Z]{3}$/, { context: keyedBy('dto.animal.currency') })
  priceCurrency?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsIn(OWNER_KINDS)
  ownerKind?: OwnerKind;

  @Transform(({ value }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim().toLowerCase()) : value))
  @ValidateIf(notNull)
  @IsEmail({}, { context: keyedBy('dto.animal.ownerEmail') })
  @MaxLength(TEXT_LIMITS.email)
  ownerEmail?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.personName)
  ownerName?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsIn(CUSTODIES)
  custody?: Custody;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.personName)
  custodyParty?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ context: keyedBy('dto.animal.dueBackOn') })
  dueBackOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsIn(ANIMAL_STATUSES)
  status?: AnimalStatus;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ context: keyedBy('dto.animal.statusOn') })
  statusOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.enclosure)
  enclosure?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.animalNotes)
  notes?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.premoltNote)
  premoltNote?: string | null;
}
