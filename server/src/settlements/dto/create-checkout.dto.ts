import { IsInt, IsUUID, Max, Min } from 'class-validator';
import type { CreateCheckoutRequest } from '@broodsilk/shared';

export class CreateCheckoutDto implements CreateCheckoutRequest {
  @IsUUID('all', { message: 'toMemberId must be the id of the party you are paying.' })
  toMemberId!: string;

  @IsInt({ message: 'amountMinor must be a whole number of minor units (cents).' })
  @Min(1, { message: 'amountMinor must be above 0.' })
  @Max(2_000_000_000)
  amountMinor!: number;
}
