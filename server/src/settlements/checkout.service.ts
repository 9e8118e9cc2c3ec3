import { ConflictException, Inject, Injectable, BadRequestException } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { EntityManager } from '@mikro-orm/postgresql';
import type Stripe from 'stripe';
import { formatMoneyCode, type CheckoutResponse, type CreateCheckoutRequest } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { appConfig } from '../config/app.config';
import { STRIPE_CLIENT } from '../payments/stripe.client';
import { providerCall } from '../payments/provider-call';
import type { ProjectAccess } from '../projects/project-access.service';
import { loadAccount } from '../accounts/account-loader';
import { User } from '../users/user.entity';
import { PayoutAccount } from './payout-account.entity';
import { SettlementCheckout } from './settlement-checkout.entity';
import { refusal } from '../common/refusal';

@Injectable()
export class CheckoutService {
  constructor(
    private readonly em: EntityManager,
    @Inject(STRIPE_CLIENT) private readonly stripe: Stripe,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  /**
   * The caller pays what they owe a party through the provider as a destination charge: the
   * money goes to the creditor's connected account, the platform only routes it. The ledger
   * entry is written by the webhook once the provider says the session is paid.
   */
  async create(access: ProjectAccess, user: AuthUser, dto: CreateCheckoutRequest): Promise<CheckoutResponse> {
    const view = await loadAccount(this.em, access.project);
    const me = access.member;
    const creditor = view.data.members.find((m) => m.id === dto.toMemberId);
    if (!creditor || creditor.role === 'caretaker') throw new BadRequestException(refusal('checkout.notParty'));
    if (creditor.id === me.id) throw new BadRequestException(refusal('checkout.notYourself'));
    const currency = view.balances.currency;
    const debt = view.balances.debts.find((d) => d.fromPartyId === me.id && d.toPartyId === creditor.id);
    if (!debt) throw new ConflictException(refusal('checkout.owesNothing', { name: view.nameOf(creditor.id) }));
    if (dto.amountMinor > debt.amountMinor) {
      const [owed, amount, over] = [debt.amountMinor, dto.amountMinor, dto.amountMinor - debt.amountMinor].map((m) => formatMoneyCode(m, currency));
      throw new ConflictException(refusal('checkout.moreThanOwed', { name: view.nameOf(creditor.id), owed, amount, over }));
    }
    const payout = creditor.user ? await this.em.findOne(PayoutAccount, { user: creditor.user.id }) : null;
    if (!payout) throw new ConflictException(refusal('checkout.noPayout', { name: view.nameOf(creditor.id) }));
    if (!payout.chargesEnabled) throw new ConflictException(refusal('checkout.payoutUnfinished', { name: view.nameOf(creditor.id) }));

    const back = `${this.app.publicUrl}/projects/${access.project.id}/account`;
    const session = await providerCall(() =>
      this.stripe.checkout.sessions.create({
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: { currency: currency.toLowerCase(), unit_amount: dto.amountMinor, product_data: { name: `Settlement: ${access.project.title}` } },
          },
        ],
        payment_intent_data: {
          transfer_data: { destination: payout.providerAccountId },
          metadata: { projectId: access.project.id, fromMemberId: me.id, toMemberId: creditor.id },
        },
        success_url: `${back}?paid={CHECKOUT_SESSION_ID}`,
        cancel_url: `${back}?cancelled=1`,
        client_reference_id: access.project.id,
        customer_email: user.email,
        metadata: { projectId: access.project.id, fromMemberId: me.id, toMemberId: creditor.id },
      }),
    );
    this.em.create(SettlementCheckout, {
      sessionId: session.id,
      project: access.project,
      fromParty: me,
      toParty: creditor,
      amountMinor: dto.amountMinor,
      currency,
      destinationAccountId: payout.providerAccountId,
      createdBy: this.em.getReference(User, user.id),
    });
    await this.em.flush();
    return { sessionId: session.id, url: session.url!, amountMinor: dto.amountMinor, currency };
  }
}
