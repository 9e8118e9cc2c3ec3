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

/** Event types that may mean a checkout session was paid; each is checked with the provider. */
const SESSION_EVENTS = new Set(['checkout.session.completed', 'checkout.session.async_payment_succeeded']);

type Handled = { received: true; duplicate: boolean };

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
  async handle(rawBody: Buffer | undefined, signature: string | undefined): Promise<Handled> {
    if (!rawBody || !signature) throw new BadRequestException('A payment webhook needs its body and the Stripe-Signature header.');
    let event: Stripe.Event;
    try {
      event = this.stripe.webhooks.constructEvent(rawBody, signature, this.config.webhookSecret);
    } catch (e) {
      throw new BadRequestException(`The webhook signature could not be verified: ${(e as Error).message}`);
    }
    if (SESSION_EVENTS.has(event.type)) return this.sessionEvent(event, (event.data.object as { id: string }).id);
    return this.once(event, async (tx) => {
      if (event.type === 'account.updated') await this.payouts.applyAccountUpdate(tx, event.data.object);
    });
  }

  /**
   * A signed event is only a hint: anyone holding the webhook secret could sign one. What is
   * recorded is the session as the provider's API reports it (status, amount, currency).
   */
  private async sessionEvent(event: Stripe.Event, sessionId: string): Promise<Handled> {
    const checkout = await this.em.fork().findOne(SettlementCheckout, { sessionId });
    if (!checkout) {
      this.logger.warn(`${event.type} for unknown session ${sessionId}; ignored`);
      return { received: true, duplicate: false };
    }
    const session = await this.stripe.checkout.sessions.retrieve(sessionId);

    return this.once(event, async (tx) => {
      if (session.payment_status !== 'paid' || session.amount_total === null || !session.currency) return;
      const recorded = await tx.execute(`select 1 from ledger_entries where provider_ref = ?`, [session.id]);
      if (recorded.length) return; // another event about the same payment
      if (session.amount_total !== checkout.amountMinor || session.currency.toUpperCase() !== checkout.currency) {
        this.logger.warn(
          `session ${session.id} paid ${session.amount_total} ${session.currency}, expected ${checkout.amountMinor} ${checkout.currency}; recording what was paid`,
        );
      }
      const mine = await tx.findOneOrFail(SettlementCheckout, checkout.id, { populate: ['fromParty', 'toParty'] });
      await this.entries.appendInTransaction(tx, await tx.findOneOrFail(Project, mine.project.id), {
        kind: 'money',
        date: this.clock.now().toISOString().slice(0, 10),
        fromParty: mine.fromParty,
        toParty: mine.toParty,
        amountMinor: session.amount_total,
        currency: session.currency.toUpperCase(),
        note: 'Paid through the payment provider.',
        source: 'payment-provider',
        providerRef: session.id,
      });
    });
  }

  /** Runs `effect` in the transaction that records the event's id, unless it was handled before. */
  private once(event: Stripe.Event, effect: (tx: EntityManager) => Promise<void>): Promise<Handled> {
    return this.em.transactional(async (tx) => {
      const inserted = await tx.execute<{ id: string }[]>(
        `insert into payment_events (id, type, received_at) values (?, ?, now()) on conflict (id) do nothing returning id`,
        [event.id, event.type],
      );
      if (!inserted.length) return { received: true as const, duplicate: true };
      await effect(tx);
      await tx.flush();
      return { received: true as const, duplicate: false };
    });
  }
}
