import { IsIn, IsInt, IsString, IsUUID, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';
import {
  HAND_OVER_METHODS,
  RECORDABLE_ENTRY_KINDS,
  type CreateEntryRequest,
  type HandOverMethod,
  type RecordableEntryKind,
  TEXT_LIMITS,
} from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

const MAX_MINOR = 2_000_000_000; // fits the integer columns

/** Types only; which fields each kind needs is checked in EntriesService with messages per kind. */
export class CreateEntryDto implements CreateEntryRequest {
  @IsIn(RECORDABLE_ENTRY_KINDS, { message: `kind must be one of: ${RECORDABLE_ENTRY_KINDS.join(', ')}.` })
  kind!: RecordableEntryKind;

  @IsCalendarDate()
  date!: string;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'memberId must be the id of a party of this project.' })
  memberId?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'sacId must be the id of a sac of this project.' })
  sacId?: string;

  @IsOptionalNonNull()
  @IsInt({ message: 'count must be a whole number.' })
  @Min(1, { message: 'count must be at least 1.' })
  @Max(100_000)
  count?: number;

  @IsOptionalNonNull()
  @IsIn(HAND_OVER_METHODS, { message: 'method must be pick-up or shipment.' })
  method?: HandOverMethod;

  @IsOptionalNonNull()
  @IsString()
  @MinLength(1)
  @MaxLength(TEXT_LIMITS.carrier)
  carrier?: string;

  @IsOptionalNonNull()
  @IsString()
  @MinLength(1)
  @MaxLength(TEXT_LIMITS.tracking)
  tracking?: string;

  @IsOptionalNonNull()
  @IsInt({ message: 'priceMinor must be a whole number of minor units (cents).' })
  @Min(0)
  @Max(MAX_MINOR)
  priceMinor?: number;

  @IsOptionalNonNull()
  @IsInt({ message: 'pricePerSpiderlingMinor must be a whole number of minor units (cents).' })
  @Min(0)
  @Max(MAX_MINOR)
  pricePerSpiderlingMinor?: number;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'fromMemberId must be the id of a party of this project.' })
  fromMemberId?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'toMemberId must be the id of a party of this project.' })
  toMemberId?: string;

  @IsOptionalNonNull()
  @IsInt({ message: 'amountMinor must be a whole number of minor units (cents).' })
  @Min(1, { message: 'amountMinor must be above 0.' })
  @Max(MAX_MINOR)
  amountMinor?: number;

  @IsOptionalNonNull()
  @Matches(/^[A-Z]{3}$/, { message: 'currency must be an ISO 4217 code such as EUR.' })
  currency?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'reversesId must be the id of an earlier entry.' })
  reversesId?: string;

  @IsOptionalNonNull()
  @IsString()
  @MinLength(3, { message: 'reason must say in a few words why the entry is reversed.' })
  @MaxLength(TEXT_LIMITS.correctionReason)
  reason?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.ledgerNote)
  note?: string;
}
