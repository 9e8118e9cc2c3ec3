import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { paymentsConfig } from '../config/payments.config';
import { stripeClientProvider } from '../payments/stripe.client';
import { AccountsModule } from '../accounts/accounts.module';
import { ProjectsModule } from '../projects/projects.module';
import { PayoutAccount } from './payout-account.entity';
import { PaymentEvent } from './payment-event.entity';
import { SettlementCheckout } from './settlement-checkout.entity';
import { PayoutAccountsService } from './payout-accounts.service';
import { CheckoutService } from './checkout.service';
import { WebhookService } from './webhook.service';
import { PayoutAccountController, ProjectSettlementsController } from './settlements.controller';
import { WebhooksController } from './webhooks.controller';

@Module({
  imports: [
    MikroOrmModule.forFeature([PayoutAccount, PaymentEvent, SettlementCheckout]),
    ConfigModule.forFeature(paymentsConfig),
    AccountsModule,
    ProjectsModule,
  ],
  controllers: [PayoutAccountController, ProjectSettlementsController, WebhooksController],
  providers: [stripeClientProvider, PayoutAccountsService, CheckoutService, WebhookService],
})
export class SettlementsModule {}
