import { Matches } from 'class-validator';
import type { CreatePayoutAccountRequest } from '@broodsilk/shared';
import { sentence } from '../../common/filters/validation-exception.factory';

export class CreatePayoutAccountDto implements CreatePayoutAccountRequest {
  @Matches(/^[A-Z]{2}$/, sentence('dto.checkout.country'))
  country!: string;
}
