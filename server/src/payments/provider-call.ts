import { BadGatewayException, ServiceUnavailableException } from '@nestjs/common';
import Stripe from 'stripe';
import { refusal } from '../common/refusal';

/**
 * Runs one call to the payment provider. Its refusals become a 502 and an unreachable provider a
 * 503, each saying that nothing was charged; callers write their rows only after the call returns.
 */
export async function providerCall<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (e) {
    if (e instanceof Stripe.errors.StripeConnectionError) {
      throw new ServiceUnavailableException(refusal('request.paymentUnreachable'));
    }
    if (e instanceof Stripe.errors.StripeError) {
      throw new BadGatewayException(refusal('request.paymentRefused', { why: e.message }));
    }
    throw e;
  }
}
