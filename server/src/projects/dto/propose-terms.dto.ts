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
import { sentence } from '../../common/filters/validation-exception.factory';

export class TermsLineDto implements TermsLineInput {
  @IsUUID('all', sentence('dto.terms.lineMember'))
  memberId!: string;

  @IsInt(sentence('dto.terms.weightWhole'))
  @Min(0, sentence('dto.terms.weightNegative'))
  @Max(1_000_000, sentence('dto.terms.weightMax'))
  weight!: number;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt(sentence('dto.terms.fixedWhole'))
  @Min(0, sentence('dto.terms.fixedNegative'))
  @Max(100_000, sentence('dto.terms.fixedMax'))
  fixedCount?: number | null;

  @IsInt(sentence('dto.terms.pickWhole'))
  @Min(1, sentence('dto.terms.pickMin'))
  @Max(1000, sentence('dto.terms.pickMax'))
  pickOrder!: number;
}

export class ProposeTermsDto implements ProposeTermsRequest {
  @IsArray(sentence('dto.terms.linesList'))
  @ArrayMinSize(1, sentence('dto.terms.linesNeeded'))
  @ValidateNested({ each: true })
  @Type(() => TermsLineDto)
  lines!: TermsLineDto[];

  @IsInt(sentence('dto.terms.priceWhole'))
  @Min(0, sentence('dto.terms.priceNegative'))
  @Max(100_000_000, sentence('dto.terms.priceTooLarge'))
  pricePerSpiderlingMinor!: number;

  @IsString(sentence('dto.terms.currencyText'))
  @Matches(/^[A-Z]{3}$/, sentence('dto.terms.currencyCapitals'))
  currency!: string;

  @IsIn(FAILURE_CLAUSES, sentence('dto.terms.failureClause', { allowed: FAILURE_CLAUSES.join(', ') }))
  failureClause!: FailureClause;

  @IsOptionalNonNull()
  @IsIn(BROOD_STAGES, sentence('dto.terms.handOverStage', { allowed: BROOD_STAGES.join(', ') }))
  handOverStage?: BroodStage;

  @IsIn(SHIPPING_PAYERS, sentence('dto.terms.shippingPaidBy', { allowed: SHIPPING_PAYERS.join(', ') }))
  shippingPaidBy!: ShippingPayer;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, sentence('dto.common.noteMax', { max: TEXT_LIMITS.note }))
  note?: string | null;
}
