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

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
/** Blank text means "none": a form's empty box and a CSV's empty cell both arrive as "". */
const blankToNull = ({ value }: { value: unknown }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim()) : value);
const notNull = (_: object, v: unknown) => v !== null && v !== undefined;
const oneOf = (what: string, list: readonly string[]) => ({ message: `${what} must be one of: ${list.join(', ')}.` });

/** The create form and every CSV row are checked by this class. */
export class CreateAnimalDto implements CreateAnimalRequest {
  @IsUUID('all', { message: 'Choose a species from the catalogue.' })
  speciesId!: string;

  @Transform(trim)
  @IsString()
  @IsNotEmpty({ message: 'Give the animal a label or code.' })
  @MaxLength(TEXT_LIMITS.animalLabel, { message: `A label can be at most ${TEXT_LIMITS.animalLabel} characters.` })
  label!: string;

  @IsIn(ANIMAL_SEXES, oneOf('sex', ANIMAL_SEXES))
  sex!: AnimalSex;

  @IsOptionalNonNull()
  @IsIn(MATURITIES, oneOf('maturity', MATURITIES))
  maturity?: Maturity;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ message: 'The maturing date must be a date written YYYY-MM-DD.' })
  maturedOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ message: 'The acquisition date must be a date written YYYY-MM-DD.' })
  acquiredOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.acquiredFrom)
  acquiredFrom?: string | null;

  @Transform(({ value }) => (value === '' ? null : typeof value === 'string' && /^-?\d+$/.test(value.trim()) ? Number(value) : value))
  @ValidateIf(notNull)
  @IsInt({ message: 'The price is a whole number of minor units (cents), e.g. 4500 for 45.00.' })
  @Min(0, { message: 'The price cannot be negative.' })
  @Max(100_000_000, { message: 'The price is too large.' })
  pricePaidMinor?: number | null;

  @Transform(({ value }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim().toUpperCase()) : value))
  @ValidateIf(notNull)
  @Matches(/^[A-Z]{3}$/, { message: 'The currency is a three-letter ISO 4217 code such as EUR or USD.' })
  priceCurrency?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsIn(OWNER_KINDS, oneOf('ownerKind', OWNER_KINDS))
  ownerKind?: OwnerKind;

  @Transform(({ value }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim().toLowerCase()) : value))
  @ValidateIf(notNull)
  @IsEmail({}, { message: 'The owner’s e-mail does not look like an e-mail address.' })
  @MaxLength(TEXT_LIMITS.email)
  ownerEmail?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.personName)
  ownerName?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsIn(CUSTODIES, oneOf('custody', CUSTODIES))
  custody?: Custody;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsString()
  @MaxLength(TEXT_LIMITS.personName)
  custodyParty?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ message: 'The due-back date must be a date written YYYY-MM-DD.' })
  dueBackOn?: string | null;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsIn(ANIMAL_STATUSES, oneOf('status', ANIMAL_STATUSES))
  status?: AnimalStatus;

  @Transform(blankToNull)
  @ValidateIf(notNull)
  @IsCalendarDate({ message: 'The status date must be a date written YYYY-MM-DD.' })
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
