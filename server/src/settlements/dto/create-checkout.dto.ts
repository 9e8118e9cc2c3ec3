import { IsInt, IsUUID, Max, Min } from 'class-validator';
import type { CreateCheckoutRequest } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class CreateCheckoutDto implements CreateCheckoutRequest {
  @IsUUID('all', { context: keyedBy('dto.checkout.payee') })
  toMemberId!: string;

  @IsInt({ context: keyedBy('dto.common.minorUnits', { field: 'amountMinor' }) })
  @Min(1, { context: keyedBy('dto.common.amountAboveZero') })
  @Max(2_000_000_000)
  amountMinor!: number;
}
