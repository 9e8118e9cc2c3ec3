import { Type } from 'class-transformer';
import { ArrayMinSize, IsArray, IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, ValidateIf, ValidateNested } from 'class-validator';
import {
  BROOD_STAGES,
  FAILURE_CLAUSES,
  SHIPPING_PAYERS,
  type BroodStage,
  type FailureClause,
  type ProposeTermsRequest,
  type ShippingPayer,
  type TermsLineInput,
  TEXT_LIMITS,
} from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class TermsLineDto implements TermsLineInput {
  @IsUUID('all', { message: 'Each line names a party of the project (memberId).' })
  memberId!: string;

  @IsInt({ message: 'A weight must be a whole number.' })
  @Min(0, { message: 'A weight cannot be negative.' })
  @Max(1_000_000, { message: 'A weight can be at most 1,000,000.' })
  weight!: number;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt({ message: 'A fixed count must be a whole number of young.' })
  @Min(0, { message: 'A fixed count cannot be negative.' })
  @Max(100_000, { message: 'A fixed count can be at most 100,000.' })
  fixedCount?: number | null;

  @IsInt({ message: 'A pick order must be a whole number (1 picks first).' })
  @Min(1, { message: 'Pick orders start at 1 (picks first).' })
  @Max(1000, { message: 'A pick order can be at most 1000.' })
  pickOrder!: number;
}

export class ProposeTermsDto implements ProposeTermsRequest {
  @IsArray({ message: 'lines must be a list with one line per party.' })
  @ArrayMinSize(1, { message: 'The terms need a line for each party.' })
  @ValidateNested({ each: true })
  @Type(() => TermsLineDto)
  lines!: TermsLineDto[];

  @IsInt({ message: 'The price per spiderling is a whole number of minor units (e.g. cents).' })
  @Min(0, { message: 'The price per spiderling cannot be negative.' })
  @Max(100_000_000, { message: 'The price per spiderling is too large.' })
  pricePerSpiderlingMinor!: number;

  @IsString({ message: 'The currency is a three-letter ISO 4217 code such as EUR.' })
  @Matches(/^[A-Z]{3}$/, { message: 'The currency is a three-letter ISO 4217 code in capitals, such as EUR.' })
  currency!: string;

  @IsIn(FAILURE_CLAUSES, { message: `The failure clause must be one of: ${FAILURE_CLAUSES.join(', ')}.` })
  failureClause!: FailureClause;

  @IsOptionalNonNull()
  @IsIn(BROOD_STAGES, { message: `The hand-over stage must be one of: ${BROOD_STAGES.join(', ')}.` })
  handOverStage?: BroodStage;

  @IsIn(SHIPPING_PAYERS, { message: `Who pays shipping must be one of: ${SHIPPING_PAYERS.join(', ')}.` })
  shippingPaidBy!: ShippingPayer;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { message: `The note can be at most ${TEXT_LIMITS.note} characters.` })
  note?: string | null;
}
