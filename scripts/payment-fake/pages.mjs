// @ts-check
/**
 * Server-rendered pages of the payment fake: onboarding and pay pages.
 * Deliberately plain, and clearly marked as a local test stand-in.
 */

/** @param {unknown} value */
export function escapeHtml(value) {
  return String(value ?? '')
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}

/**
 * Formats an integer amount in minor units, e.g. (12345, 'eur') → "€123.45".
 * @param {number} minor
 * @param {string} currency ISO 4217 code, any case
 */
export function formatMoney(minor, currency) {
  const code = currency.toUpperCase();
  try {
    const format = new Intl.NumberFormat('en', { style: 'currency', currency: code });
    const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
    return format.format(minor / 10 ** digits);
  } catch {
    return `${minor} ${code} (minor units)`;
  }
}

const STYLE = `
  body { font-family: system-ui, sans-serif; margin: 0; background: #f4f1ea; color: #2b2620; }
  .banner { background: #5b3a1e; color: #fff8ec; padding: .6rem 1rem; font-size: .9rem; }
  main { max-width: 32rem; margin: 2rem auto; background: #fff; border: 1px solid #d9cfbf; border-radius: 8px; padding: 1.5rem; }
  h1 { font-size: 1.3rem; margin-top: 0; }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: .3rem 1rem; }
  dt { color: #6b6052; } dd { margin: 0; font-variant-numeric: tabular-nums; }
  .actions { display: flex; gap: .75rem; margin-top: 1.5rem; }
  button { font: inherit; padding: .55rem 1.1rem; border-radius: 6px; border: 1px solid #5b3a1e; cursor: pointer; }
  button.primary { background: #5b3a1e; color: #fff; }
  button.secondary { background: #fff; color: #5b3a1e; }
  table { width: 100%; border-collapse: collapse; margin: 1rem 0; }
  td, th { text-align: left; padding: .3rem 0; border-bottom: 1px solid #eee4d5; }
  .note { color: #6b6052; font-size: .85rem; }
`;

/**
 * @param {string} title
 * @param {string} body HTML, already escaped
 */
export function page(title, body) {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · local payment test stand-in</title>
<style>${STYLE}</style>
</head>
<body>
<div class="banner" role="note">Local test stand-in for the payment provider. No real money moves and no real account is created.</div>
<main>
<h1>${escapeHtml(title)}</h1>
${body}
</main>
</body>
</html>
`;
}

/**
 * @param {{ account: { id: string, email: string | null, country?: string, details_submitted: boolean }, linkToken: string }} p
 */
export function onboardingPage({ account, linkToken }) {
  const action = `/onboarding/${encodeURIComponent(account.id)}`;
  return page(
    'Test onboarding',
    `<p>This page stands in for the provider's hosted onboarding of a connected account.</p>
<dl>
  <dt>Account</dt><dd data-field="account">${escapeHtml(account.id)}</dd>
  <dt>E-mail</dt><dd>${escapeHtml(account.email ?? '—')}</dd>
  <dt>Country</dt><dd>${escapeHtml(account.country ?? '—')}</dd>
  <dt>Details submitted</dt><dd data-field="details_submitted">${account.details_submitted ? 'yes' : 'no'}</dd>
</dl>
<div class="actions">
  <form method="post" action="${escapeHtml(action)}">
    <input type="hidden" name="link" value="${escapeHtml(linkToken)}">
    <input type="hidden" name="action" value="complete">
    <button class="primary" type="submit">Complete test onboarding</button>
  </form>
  <form method="post" action="${escapeHtml(action)}">
    <input type="hidden" name="link" value="${escapeHtml(linkToken)}">
    <input type="hidden" name="action" value="leave">
    <button class="secondary" type="submit">Leave without finishing</button>
  </form>
</div>
<p class="note">Completing marks the account able to take charges and receive payouts, sends an <code>account.updated</code> event and returns to the platform.</p>`,
  );
}

/**
 * @param {{
 *   session: { id: string, amount_total: number, currency: string, status: string, payment_status: string },
 *   lineItems: { name: string, unitAmount: number, quantity: number }[],
 *   destination: string | null,
 *   applicationFeeAmount: number | null,
 * }} p
 */
export function payPage({ session, lineItems, destination, applicationFeeAmount }) {
  const base = `/pay/${encodeURIComponent(session.id)}`;
  const rows = lineItems
    .map((li) => `<tr><td>${escapeHtml(li.name)}</td><td>${li.quantity} ×</td><td>${escapeHtml(formatMoney(li.unitAmount, session.currency))}</td></tr>`)
    .join('\n');
  const open = session.status === 'open';
  return page(
    'Pay (test)',
    `<table><thead><tr><th>Item</th><th>Qty</th><th>Unit price</th></tr></thead><tbody>
${rows}
</tbody></table>
<dl>
  <dt>Total</dt><dd data-field="amount">${escapeHtml(formatMoney(session.amount_total, session.currency))}</dd>
  <dt>Amount (minor units)</dt><dd data-field="amount_total">${session.amount_total}</dd>
  <dt>Currency</dt><dd data-field="currency">${escapeHtml(session.currency)}</dd>
  <dt>Paid to</dt><dd data-field="destination">${escapeHtml(destination ?? 'the platform')}</dd>
  ${applicationFeeAmount != null ? `<dt>Platform fee</dt><dd data-field="application_fee_amount">${escapeHtml(formatMoney(applicationFeeAmount, session.currency))}</dd>` : ''}
  <dt>Status</dt><dd data-field="status">${escapeHtml(session.status)} / ${escapeHtml(session.payment_status)}</dd>
</dl>
${
  open
    ? `<div class="actions">
  <form method="post" action="${escapeHtml(base)}"><button class="primary" type="submit">Pay (test)</button></form>
  <form method="post" action="${escapeHtml(`${base}/cancel`)}"><button class="secondary" type="submit">Cancel</button></form>
</div>
<p class="note">Paying completes the checkout session at once, sends a <code>checkout.session.completed</code> event and returns to the platform.</p>`
    : `<p>This checkout session is ${escapeHtml(session.status)}; nothing more can be paid here.</p>`
}`,
  );
}

/** @param {string} title @param {string} message */
export function messagePage(title, message) {
  return page(title, `<p>${escapeHtml(message)}</p>`);
}
