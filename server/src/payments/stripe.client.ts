import type { FactoryProvider } from '@nestjs/common';
import Stripe from 'stripe';
import { paymentsConfig, type PaymentsConfig } from '../config/payments.config';

/** Injection token of the configured Stripe SDK client: `@Inject(STRIPE_CLIENT) stripe: Stripe`. */
export const STRIPE_CLIENT = Symbol('STRIPE_CLIENT');

/** The options handed to the SDK, apart from the key. Exposed for tests. */
export function stripeClientOptions(config: PaymentsConfig): NonNullable<ConstructorParameters<typeof Stripe>[1]> {
  return {
    ...(config.apiHost ? { host: config.apiHost } : {}),
    ...(config.apiPort ? { port: config.apiPort } : {}),
    ...(config.apiProtocol ? { protocol: config.apiProtocol } : {}),
    // The SDK types only its own pinned version; another one is the operator's explicit choice.
    ...(config.apiVersion ? { apiVersion: config.apiVersion as Stripe.LatestApiVersion } : {}),
    appInfo: { name: 'Broodsilk' },
  };
}

/** Builds the real SDK client from the payment settings; fails loudly without a secret key. */
export function createStripeClient(config: PaymentsConfig): Stripe {
  if (!config.secretKey) {
    throw new Error('Payment configuration error: STRIPE_SECRET_KEY is not set (in development, use the key the local payment fake was started with)');
  }
  return new Stripe(config.secretKey, stripeClientOptions(config));
}

/**
 * Nest provider of the Stripe client. A module that uses it also needs
 * `ConfigModule.forFeature(paymentsConfig)` in its imports.
 */
export const stripeClientProvider: FactoryProvider<Stripe> = {
  provide: STRIPE_CLIENT,
  inject: [paymentsConfig.KEY],
  useFactory: (config: PaymentsConfig) => createStripeClient(config),
};
