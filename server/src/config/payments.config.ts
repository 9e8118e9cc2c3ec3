import { registerAs } from '@nestjs/config';

/**
 * Settings for the payment provider (Stripe). In development and tests the
 * API host, port and protocol point at the local fake in scripts/payment-fake;
 * in production they are left unset and the SDK uses the provider's own host.
 */
export interface PaymentsConfig {
  /** Secret API key, `sk_…`. Empty when not configured. */
  secretKey: string;
  /** Signing secret of the webhook endpoint, `whsec_…`. Empty when not configured. */
  webhookSecret: string;
  /** Overrides the provider's API host, e.g. `127.0.0.1` for the local fake. */
  apiHost: string | null;
  apiPort: number | null;
  apiProtocol: 'http' | 'https' | null;
  /** Pins an API version; null keeps the SDK's own pinned version. */
  apiVersion: string | null;
}

/** Reads the payment settings from an environment; throws on malformed values. */
export function readPaymentsConfig(env: NodeJS.ProcessEnv = process.env): PaymentsConfig {
  const problems: string[] = [];
  const text = (key: string): string | null => {
    const value = env[key]?.trim();
    return value ? value : null;
  };

  const secretKey = text('STRIPE_SECRET_KEY') ?? '';
  if (secretKey && !/^(sk|rk)_/.test(secretKey)) {
    problems.push('STRIPE_SECRET_KEY must be a secret (sk_…) or restricted (rk_…) API key');
  }
  const webhookSecret = text('STRIPE_WEBHOOK_SECRET') ?? '';

  const portText = text('STRIPE_API_PORT');
  let apiPort: number | null = null;
  if (portText !== null) {
    apiPort = Number(portText);
    if (!/^\d+$/.test(portText) || apiPort < 1 || apiPort > 65535) {
      problems.push(`STRIPE_API_PORT must be a port number (1-65535), not "${portText}"`);
      apiPort = null;
    }
  }

  const protocolText = text('STRIPE_API_PROTOCOL')?.toLowerCase() ?? null;
  let apiProtocol: 'http' | 'https' | null = null;
  if (protocolText !== null) {
    if (protocolText === 'http' || protocolText === 'https') apiProtocol = protocolText;
    else problems.push(`STRIPE_API_PROTOCOL must be "http" or "https", not "${protocolText}"`);
  }

  if (problems.length) throw new Error(`Payment configuration error:\n- ${problems.join('\n- ')}`);
  return {
    secretKey,
    webhookSecret,
    apiHost: text('STRIPE_API_HOST'),
    apiPort,
    apiProtocol,
    apiVersion: text('STRIPE_API_VERSION'),
  };
}

export const paymentsConfig = registerAs('payments', (): PaymentsConfig => readPaymentsConfig(process.env));
