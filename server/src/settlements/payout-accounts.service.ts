import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { EntityManager } from '@mikro-orm/postgresql';
import type Stripe from 'stripe';
import type { CreatePayoutAccountRequest, PayoutAccountResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { appConfig } from '../config/app.config';
import { STRIPE_CLIENT } from '../payments/stripe.client';
import { providerCall } from '../payments/provider-call';
import { User } from '../users/user.entity';
import { PayoutAccount } from './payout-account.entity';
import { toPayoutResponse } from './payout-accounts.mapper';

@Injectable()
export class PayoutAccountsService {
  constructor(
    private readonly em: EntityManager,
    @Inject(STRIPE_CLIENT) private readonly stripe: Stripe,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  async status(user: AuthUser): Promise<PayoutAccountResponse> {
    return toPayoutResponse(await this.em.findOne(PayoutAccount, { user: user.id }));
  }

  /**
   * Links a connected (express) account for the keeper, or reuses theirs, and returns a fresh
   * onboarding link: the provider collects bank and identity details, never this product.
   */
  async link(user: AuthUser, dto: CreatePayoutAccountRequest): Promise<PayoutAccountResponse> {
    const existing = await this.em.findOne(PayoutAccount, { user: user.id });
    // Both provider calls come first, so a refusal stores nothing; the idempotency key gives a retry the same account.
    const providerAccountId =
      existing?.providerAccountId ??
      (
        await providerCall(() =>
          this.stripe.accounts.create(
            {
              type: 'express',
              country: dto.country,
              email: user.email,
              capabilities: { card_payments: { requested: true }, transfers: { requested: true } },
              metadata: { userId: user.id },
            },
            { idempotencyKey: `payout-account-${user.id}` },
          ),
        )
      ).id;
    const link = await providerCall(() =>
      this.stripe.accountLinks.create({
        account: providerAccountId,
        type: 'account_onboarding',
        refresh_url: `${this.app.publicUrl}/settings/payouts?again=1`,
        return_url: `${this.app.publicUrl}/settings/payouts?done=1`,
      }),
    );
    const account = existing ?? this.em.create(PayoutAccount, { user: this.em.getReference(User, user.id), providerAccountId });
    await this.em.flush();
    return toPayoutResponse(account, link.url);
  }

  /** `account.updated` from the provider's webhook, inside the webhook's transaction. */
  async applyAccountUpdate(tx: EntityManager, a: Stripe.Account): Promise<void> {
    const account = await tx.findOne(PayoutAccount, { providerAccountId: a.id });
    if (!account) return;
    account.chargesEnabled = !!a.charges_enabled;
    account.payoutsEnabled = !!a.payouts_enabled;
    account.detailsSubmitted = !!a.details_submitted;
  }
}
