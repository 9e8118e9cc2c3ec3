// Types of server.mjs for TypeScript callers (the server's tests).

export interface PaymentFakeOptions {
  /** TCP port; 0 (the default) picks a free one. */
  port?: number;
  /** Interface to bind; default 127.0.0.1. */
  host?: string;
  /** The only API key accepted (`sk_…`). */
  secretKey: string;
  /** Signing secret for webhook deliveries (`whsec_…`). */
  webhookSecret: string;
  /** Where events are POSTed; without it events are only logged. */
  webhookUrl?: string;
  /** Base URL put in onboarding and pay links; default `http://host:port`. */
  publicUrl?: string;
  /** `api_version` of events; default: the version the SDK sent when the object was created. */
  apiVersion?: string;
  /** Waits before each retry of a failed delivery; default [250, 1000]. */
  retryDelaysMs?: number[];
  /** Per delivery attempt; default 1500. */
  attemptTimeoutMs?: number;
  /** How long a page or redeliver call waits for a delivery before answering; default 2000. */
  responseBudgetMs?: number;
}

export interface DeliveryRecord {
  eventId: string;
  type: string;
  url: string | null;
  /** 1 for the first try of a send, 0 when no webhook URL was configured. */
  attempt: number;
  /** True when asked for through POST /_fake/redeliver/:eventId. */
  redelivery: boolean;
  /** The `t` of the Stripe-Signature header. */
  signedAt: number | null;
  status: number | null;
  ok: boolean;
  error: string | null;
  at: string;
}

export interface PaymentFakeState {
  accounts: Map<string, Record<string, any>>;
  accountLinks: Map<string, { token: string; account: string; refresh_url: string; return_url: string; expires_at: number; used: boolean }>;
  checkoutSessions: Map<string, Record<string, any>>;
  paymentIntents: Map<string, Record<string, any>>;
  events: Record<string, any>[];
  deliveries: DeliveryRecord[];
}

export interface PaymentFake {
  port: number;
  url: string;
  state: PaymentFakeState;
  setWebhookUrl(url: string | null): void;
  whenDeliveriesSettled(): Promise<void>;
  close(): Promise<void>;
}

export function startPaymentFake(options: PaymentFakeOptions): Promise<PaymentFake>;

/** `t=<unix seconds>,v1=<hex HMAC-SHA256(secret, "<t>.<payload>")>` */
export function signatureHeader(payload: string, secret: string, timestamp?: number): string;

export type FormValue = string | FormObject | FormValue[];
export interface FormObject {
  [key: string]: FormValue;
}
export function parseFormBody(text: string): FormObject;

export function makeId(prefix: string, length?: number): string;
