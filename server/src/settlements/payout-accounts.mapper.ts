import type { PayoutAccountResponse } from '@broodsilk/shared';
import type { PayoutAccount } from './payout-account.entity';

export function toPayoutResponse(p: PayoutAccount | null, onboardingUrl: string | null = null): PayoutAccountResponse {
  return {
    linked: !!p,
    accountId: p?.providerAccountId ?? null,
    chargesEnabled: p?.chargesEnabled ?? false,
    payoutsEnabled: p?.payoutsEnabled ?? false,
    detailsSubmitted: p?.detailsSubmitted ?? false,
    onboardingUrl,
  };
}
