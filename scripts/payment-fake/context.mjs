// @ts-check
/**
 * Types of the one context every part of the payment fake shares. server.mjs
 * creates it; every other module takes it as its first argument. Types only.
 */

/**
 * @typedef {object} PaymentFakeOptions
 * @property {number} [port] TCP port; 0 (the default) picks a free one.
 * @property {string} [host] interface to bind; default 127.0.0.1.
 * @property {string} secretKey the only API key accepted (`sk_…`).
 * @property {string} webhookSecret signing secret for webhook deliveries (`whsec_…`).
 * @property {string} [webhookUrl] where events are POSTed; without it events are only logged.
 * @property {string} [publicUrl] base URL put in onboarding and pay links; default `http://host:port`.
 * @property {string} [apiVersion] `api_version` of events; default: the version the SDK sent.
 * @property {number[]} [retryDelaysMs] waits before each retry of a failed delivery; default [250, 1000].
 * @property {number} [attemptTimeoutMs] per delivery attempt; default 1500.
 * @property {number} [responseBudgetMs] how long a page waits for a delivery before answering; default 2000.
 */

/**
 * @typedef {object} DeliveryRecord
 * @property {string} eventId
 * @property {string} type
 * @property {string | null} url
 * @property {number} attempt 1 for the first try of a send
 * @property {boolean} redelivery true when asked for through /_fake/redeliver
 * @property {number | null} signedAt the `t` of the signature header
 * @property {number | null} status HTTP status the target answered
 * @property {boolean} ok
 * @property {string | null} error
 * @property {string} at ISO time of the attempt
 */

/**
 * @typedef {{ token: string, account: string, refresh_url: string, return_url: string, expires_at: number, used: boolean }} AccountLinkRecord
 * @typedef {{ name: string, unitAmount: number, quantity: number }} LineItem
 */

/**
 * What callers read as `fake.state`.
 * @typedef {object} PaymentFakeState
 * @property {Map<string, Record<string, any>>} accounts connected accounts by id
 * @property {Map<string, AccountLinkRecord>} accountLinks onboarding links by token
 * @property {Map<string, Record<string, any>>} checkoutSessions Checkout Sessions by id
 * @property {Map<string, Record<string, any>>} paymentIntents PaymentIntents by id
 * @property {Record<string, any>[]} events every event, oldest first
 * @property {DeliveryRecord[]} deliveries every delivery attempt, oldest first
 */

/**
 * Details of a session that its public object does not show.
 * @typedef {object} SessionDetails
 * @property {LineItem[]} lineItems
 * @property {string | null} destination
 * @property {number | null} applicationFeeAmount
 * @property {Record<string, string>} paymentIntentMetadata
 * @property {string | null} customerEmail
 */

/**
 * @typedef {object} FakeConfig
 * @property {string} secretKey
 * @property {string} webhookSecret
 * @property {string | null} webhookUrl changed by `setWebhookUrl`
 * @property {string} publicUrl base of links handed out; set once listening unless given
 * @property {string | null} apiVersion fixed `api_version` of events, if given
 * @property {number[]} retryDelaysMs
 * @property {number} attemptTimeoutMs
 * @property {number} responseBudgetMs
 */

/**
 * Tables behind the public state.
 * @typedef {object} FakeInternals
 * @property {Map<string, SessionDetails>} sessionDetails by session id
 * @property {Map<string, string>} eventPayloads raw bodies of events, so a redelivery sends the same bytes
 * @property {Map<string, string>} apiVersions versions the SDK sent when creating an object, for the events about it
 * @property {Map<string, { status: number, body: string }>} idempotent replies to POSTs by idempotency key
 */

/**
 * Deliveries under way, so close() can cut them short.
 * @typedef {object} FakeFlight
 * @property {boolean} closed
 * @property {AbortController} closing aborts attempts in flight
 * @property {Set<Promise<unknown>>} pending
 * @property {Set<{ timer: NodeJS.Timeout, resolve: () => void }>} sleepers waits between retries
 */

/**
 * @typedef {object} FakeContext
 * @property {FakeConfig} config
 * @property {PaymentFakeState} state
 * @property {FakeInternals} internal
 * @property {FakeFlight} flight
 */

export {};
