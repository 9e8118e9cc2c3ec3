import { BadRequestException, Inject, Injectable, Logger } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import Stripe from 'stripe';
import { paymentsConfig, type PaymentsConfig } from '../config/payments.config';
import { STRIPE_CLIENT } from '../payments/stripe.client';
import { EntriesService } from '../accounts/entries.service';
import { Project } from '../projects/project.entity';
import { PayoutAccountsService } from './payout-accounts.service';
import { SettlementCheckout } from './settlement-checkout.entity';
import { Clock } from '../common/clock';

@Injectable()
export class WebhookService {
  private readonly logger = new Logger(WebhookService.name);

  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    @Inject(STRIPE_CLIENT) private readonly stripe: Stripe,
    @Inject(paymentsConfig.KEY) private readonly config: PaymentsConfig,
    private readonly entries: EntriesService,
    private readonly payouts: PayoutAccountsService,
  ) {}

  /**
   * Verifies the signature over the exact bytes (and the timestamp's tolerance), then handles the
   * event once: its id goes into `payment_events` in the same transaction as its effect, so a
   * redelivery finds it there and changes nothing.
   */
  async handle(rawBody: Buffer | undefined, signature: string | undefined): Promise<{ received: true; duplicate: boolean }> {
    if (!rawBody || !signature) throw new BadRequestException('A payment webhook needs its body and the Stripe-Signature header.');
    let event: Stripe.Event;
    try {
      event = this.stripe.webhooks.constructEvent(rawBody, signature, this.config.webhookSecret);
    } catch (e) {
      throw new BadRequestException(`The webhook signature could not be verified: ${(e as Error).message}`);
    }
    return this.em.transactional(async (tx) => {
      const inserted = await tx.execute<{ id: string }[]>(
        `insert into payment_events (id, type, received_at) values (?, ?, now()) on conflict (id) do nothing returning id`,
        [event.id, event.type],
      );
      if (!inserted.length) return { received: true as const, duplicate: true };
      if (event.type === 'checkout.session.completed') await this.sessionCompleted(tx, event.data.object);
      if (event.type === 'account.updated') await this.payouts.applyAccountUpdate(tx, event.data.object);
      await tx.flush();
      return { received: true as const, duplicate: false };
    });
  }

  private async sessionCompleted(tx: EntityManager, session: Stripe.Checkout.Session): Promise<void> {
    const checkout = await tx.findOne(SettlementCheckout, { sessionId: session.id }, { populate: ['fromParty', 'toParty'] });
    if (!checkout) {
      this.logger.warn(`checkout.session.completed for unknown session ${session.id}; ignored`);
      return;
    }
    if (session.payment_status !== 'paid') return;
    if (session.amount_total !== checkout.amountMinor || session.currency?.toUpperCase() !== checkout.currency) {
      this.logger.warn(
        `session ${session.id} paid ${session.amount_total} ${session.currency}, expected ${checkout.amountMinor} ${checkout.currency}; recording what was paid`,
      );
    }
    const project = await tx.findOneOrFail(Project, checkout.project.id);
    await this.entries.appendInTransaction(tx, project, {
      kind: 'money',
      date: this.clock.now().toISOString().slice(0, 10),
      fromParty: checkout.fromParty,
      toParty: checkout.toParty,
      amountMinor: session.amount_total ?? checkout.amountMinor,
      currency: (session.currency ?? checkout.currency).toUpperCase(),
      note: 'Paid through the payment provider.',
      source: 'payment-provider',
      providerRef: session.id,
    });
  }
}
