import { IsInt, IsUUID, Max, Min } from 'class-validator';
import type { CreateCheckoutRequest } from '@broodsilk/shared';
import { sentence } from '../../common/filters/validation-exception.factory';

export class CreateCheckoutDto implements CreateCheckoutRequest {
  @IsUUID('all', sentence('dto.checkout.payee'))
  toMemberId!: string;

  @IsInt(sentence('dto.common.minorUnits', { field: 'amountMinor' }))
  @Min(1, sentence('dto.common.amountAboveZero'))
  @Max(2_000_000_000)
  amountMinor!: number;
}
