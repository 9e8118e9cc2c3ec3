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
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class TermsLineDto implements TermsLineInput {
  @IsUUID('all', { context: keyedBy('dto.terms.lineMember') })
  memberId!: string;

  @IsInt({ context: keyedBy('dto.terms.weightWhole') })
  @Min(0, { context: keyedBy('dto.terms.weightNegative') })
  @Max(1_000_000, { context: keyedBy('dto.terms.weightMax') })
  weight!: number;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsInt({ context: keyedBy('dto.terms.fixedWhole') })
  @Min(0, { context: keyedBy('dto.terms.fixedNegative') })
  @Max(100_000, { context: keyedBy('dto.terms.fixedMax') })
  fixedCount?: number | null;

  @IsInt({ context: keyedBy('dto.terms.pickWhole') })
  @Min(1, { context: keyedBy('dto.terms.pickMin') })
  @Max(1000, { context: keyedBy('dto.terms.pickMax') })
  pickOrder!: number;
}

export class ProposeTermsDto implements ProposeTermsRequest {
  @IsArray({ context: keyedBy('dto.terms.linesList') })
  @ArrayMinSize(1, { context: keyedBy('dto.terms.linesNeeded') })
  @ValidateNested({ each: true })
  @Type(() => TermsLineDto)
  lines!: TermsLineDto[];

  @IsInt({ context: keyedBy('dto.terms.priceWhole') })
  @Min(0, { context: keyedBy('dto.terms.priceNegative') })
  @Max(100_000_000, { context: keyedBy('dto.terms.priceTooLarge') })
  pricePerSpiderlingMinor!: number;

  @IsString({ context: keyedBy('dto.terms.currencyText') })
  @Matches(/^[A-Z]{3}$/, { context: keyedBy('dto.terms.currencyCapitals') })
  currency!: string;

  @IsIn(FAILURE_CLAUSES, { context: keyedBy('dto.terms.failureClause', { allowed: FAILURE_CLAUSES.join(', ') }) })
  failureClause!: FailureClause;

  @IsOptionalNonNull()
  @IsIn(BROOD_STAGES, { context: keyedBy('dto.terms.handOverStage', { allowed: BROOD_STAGES.join(', ') }) })
  handOverStage?: BroodStage;

  @IsIn(SHIPPING_PAYERS, { context: keyedBy('dto.terms.shippingPaidBy', { allowed: SHIPPING_PAYERS.join(', ') }) })
  shippingPaidBy!: ShippingPayer;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_LIMITS.note, { context: keyedBy('dto.common.noteMax', { max: TEXT_LIMITS.note }) })
  note?: string | null;
}
