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
import { keyedBy } from '../../common/filters/validation-exception.factory';

const MAX_MINOR = 2_000_000_000; // fits the integer columns

/** Types only; which fields each kind needs is checked in EntriesService with messages per kind. */
export class CreateEntryDto implements CreateEntryRequest {
  @IsIn(RECORDABLE_ENTRY_KINDS)
  kind!: RecordableEntryKind;

  @IsCalendarDate()
  date!: string;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.account.partyId', { field: 'memberId' }) })
  memberId?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.account.sacId') })
  sacId?: string;

  @IsOptionalNonNull()
  @IsInt()
  @Min(1)
  @Max(100_000)
  count?: number;

  @IsOptionalNonNull()
  @IsIn(HAND_OVER_METHODS, { context: keyedBy('dto.account.method') })
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
  @IsInt({ context: keyedBy('dto.common.minorUnits', { field: 'priceMinor' }) })
  @Min(0)
  @Max(MAX_MINOR)
  priceMinor?: number;

  @IsOptionalNonNull()
  @IsInt({ context: keyedBy('dto.common.minorUnits', { field: 'pricePerSpiderlingMinor' }) })
  @Min(0)
  @Max(MAX_MINOR)
  pricePerSpiderlingMinor?: number;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.account.partyId', { field: 'fromMemberId' }) })
  fromMemberId?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.account.partyId', { field: 'toMemberId' }) })
  toMemberId?: string;

  @IsOptionalNonNull()
  @IsInt({ context: keyedBy('dto.common.minorUnits', { field: 'amountMinor' }) })
  @Min(1, { context: keyedBy('dto.common.amountAboveZero') })
  @Max(MAX_MINOR)
  amountMinor?: number;

  @IsOptionalNonNull()
  @Matches(/^[A-Z]{3}$/, { context: keyedBy('dto.account.currency') })
  currency?: string;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.account.reversesId') })
  reversesId?: string;

  @IsOptionalNonNull()
  @IsString()
  @MinLength(3, { context: keyedBy('dto.account.reversedWhy') })
  @MaxLength(TEXT_LIMITS.correctionReason)
  reason?: string;

  @IsOptionalNonNull()
  @IsString()
  @MaxLength(TEXT_LIMITS.ledgerNote)
  note?: string;
}
