import { Matches } from 'class-validator';
import type { CreatePayoutAccountRequest } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class CreatePayoutAccountDto implements CreatePayoutAccountRequest {
  @Matches(/^[A-Z]{2}$/, { context: keyedBy('dto.checkout.country') })
  country!: string;
}
