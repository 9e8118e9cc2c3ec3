import { Matches } from 'class-validator';
import type { CreatePayoutAccountRequest } from '@broodsilk/shared';

export class CreatePayoutAccountDto implements CreatePayoutAccountRequest {
  @Matches(/^[A-Z]{2}$/, { message: 'country must be a two-letter ISO 3166 country code such as DE.' })
  country!: string;
}
