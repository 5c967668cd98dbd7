// The stand-in's own pages: hosted payment and seller onboarding. Plain HTML forms that work
// without JavaScript; a neutral look of our own, clearly marked as a local test stand-in.
import { formatMoney } from './money';
import type { ShippingInput } from './checkout-payment';
import type { Account, CheckoutSession, LineItem } from './types';

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

const STYLE = `
  :root { color-scheme: light; font-family: system-ui, sans-serif; }
  body { margin: 0; background: #f3f3f0; color: #1d1d1b; }
  main { max-width: 34rem; margin: 2rem auto; background: #fff; border: 1px solid #c9c9c2; border-radius: 6px; padding: 1.5rem; }
  h1 { font-size: 1.35rem; margin: 0 0 .25rem; }
  .note { background: #fff7d6; border: 1px solid #d9c76a; padding: .5rem .75rem; border-radius: 4px; font-size: .9rem; }
  table { width: 100%; border-collapse: collapse; margin: 1rem 0; }
  th, td { text-align: left; padding: .35rem .25rem; border-bottom: 1px solid #e2e2dc; }
  td.num, th.num { text-align: right; white-space: nowrap; }
  dt { font-weight: 600; } dd { margin: 0 0 .5rem; }
  tfoot td { font-weight: 700; border-bottom: 0; }
  label { display: block; font-weight: 600; margin-top: .9rem; }
  fieldset { border: 1px solid #c9c9c2; border-radius: 4px; margin: 1rem 0 0; padding: 0 .75rem .75rem; }
  legend { font-weight: 700; padding: 0 .25rem; }
  select { font: inherit; width: 100%; padding: .5rem; border: 1px solid #8a8a82; border-radius: 4px; background: #fff; }
  input { font: inherit; width: 100%; box-sizing: border-box; padding: .5rem; border: 1px solid #8a8a82; border-radius: 4px; }
  .row { display: flex; gap: 1rem; } .row > div { flex: 1; }
  button { font: inherit; margin-top: 1.25rem; width: 100%; padding: .7rem; background: #2f4a2a; color: #fff; border: 0; border-radius: 4px; cursor: pointer; }
  button:focus-visible, input:focus-visible, select:focus-visible, a:focus-visible { outline: 3px solid #d98f00; outline-offset: 2px; }
  .error { background: #fbe4e1; border: 1px solid #b3261e; color: #7a1410; padding: .5rem .75rem; border-radius: 4px; margin-top: 1rem; }
  .muted { color: #5b5b55; font-size: .9rem; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
${body}
</main>
</body>
</html>
`;
}

export interface PayPageValues {
  cardNumber?: string;
  cardExpiry?: string;
  email?: string;
  name?: string;
  shipping?: ShippingInput;
}

const SHIPPING_FIELDS: Array<{ key: Exclude<keyof ShippingInput, 'country'>; label: string; autocomplete: string; required: boolean }> = [
  { key: 'name', label: 'Full name', autocomplete: 'shipping name', required: true },
  { key: 'line1', label: 'Street address', autocomplete: 'shipping address-line1', required: true },
  { key: 'line2', label: 'Apartment, unit, building (optional)', autocomplete: 'shipping address-line2', required: false },
  { key: 'city', label: 'City', autocomplete: 'shipping address-level2', required: true },
  { key: 'state', label: 'State, province or region', autocomplete: 'shipping address-level1', required: false },
  { key: 'postal_code', label: 'Postal code', autocomplete: 'shipping postal-code', required: true },
];

function shippingFieldset(allowed: readonly string[], values: ShippingInput): string {
  const fields = SHIPPING_FIELDS.map(
    (f) => `<label for="shipping-${f.key}">${escapeHtml(f.label)}</label>
<input id="shipping-${f.key}" name="shipping_${f.key}" autocomplete="${f.autocomplete}"${f.required ? ' required' : ''} value="${escapeHtml(values[f.key] ?? '')}">`,
  ).join('\n');
  const chosen = values.country ?? allowed[0];
  const options = allowed.map((c) => `<option value="${escapeHtml(c)}"${c === chosen ? ' selected' : ''}>${escapeHtml(c)}</option>`).join('');
  return `<fieldset>
<legend>Shipping address</legend>
${fields}
<label for="shipping-country">Country</label>
<select id="shipping-country" name="shipping_country" autocomplete="shipping country">${options}</select>
</fieldset>`;
}

export function payPage(session: CheckoutSession, lineItems: readonly LineItem[], options: { error?: string; values?: PayPageValues; askEmail: boolean }): string {
  const values = options.values ?? {};
  const rows = lineItems
    .map(
      (li) => `<tr><td>${escapeHtml(li.description)}</td><td class="num">${li.quantity}</td><td class="num">${escapeHtml(formatMoney(li.price.unit_amount, li.currency))}</td><td class="num">${escapeHtml(formatMoney(li.amount_total, li.currency))}</td></tr>`,
    )
    .join('\n');
  const error = options.error ? `<div class="error" role="alert" id="payment-error">${escapeHtml(options.error)}</div>` : '';
  const cancel = session.cancel_url ? `<p class="muted"><a href="${escapeHtml(session.cancel_url)}">Cancel and go back</a></p>` : '';
  const emailField = options.askEmail
    ? `<label for="payer-email">Email</label>
<input id="payer-email" name="email" type="email" autocomplete="email" required value="${escapeHtml(values.email ?? '')}">`
    : '';
  return layout(
    'Test payment — local stand-in',
    `<h1>Test payment — local stand-in</h1>
<p class="note">Nothing is charged: this page belongs to the local payment stand-in. Test cards: <strong>4242 4242 4242 4242</strong> pays, <strong>4000 0000 0000 0002</strong> is declined. Any future expiry date, any 3-digit CVC.</p>
<p>Amount due: <strong id="amount-due">${escapeHtml(formatMoney(session.amount_total, session.currency))}</strong></p>
<table>
<caption class="muted">Items</caption>
<thead><tr><th scope="col">Item</th><th scope="col" class="num">Qty</th><th scope="col" class="num">Unit price</th><th scope="col" class="num">Amount</th></tr></thead>
<tbody>
${rows}
</tbody>
<tfoot><tr><td colspan="3">Total</td><td class="num">${escapeHtml(formatMoney(session.amount_total, session.currency))}</td></tr></tfoot>
</table>
${error}
<form method="post" action="/pay/${escapeHtml(session.id)}" novalidate>
${emailField}
${session.shipping_address_collection ? shippingFieldset(session.shipping_address_collection.allowed_countries, values.shipping ?? {}) : ''}
<label for="card-name">Name on card</label>
<input id="card-name" name="name" autocomplete="cc-name" value="${escapeHtml(values.name ?? '')}">
<label for="card-number">Card number</label>
<input id="card-number" name="card_number" inputmode="numeric" autocomplete="cc-number" placeholder="4242 4242 4242 4242" required value="${escapeHtml(values.cardNumber ?? '')}">
<div class="row">
<div>
<label for="card-expiry">Expiry (MM / YY)</label>
<input id="card-expiry" name="card_expiry" inputmode="numeric" autocomplete="cc-exp" placeholder="MM / YY" required value="${escapeHtml(values.cardExpiry ?? '')}">
</div>
<div>
<label for="card-cvc">CVC</label>
<input id="card-cvc" name="card_cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="123" required>
</div>
</div>
<button type="submit">Pay</button>
</form>
${cancel}`,
  );
}

export function sessionClosedPage(session: CheckoutSession): string {
  if (session.status === 'complete') {
    const back = session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);
    return layout(
      'Payment complete — local stand-in',
      `<h1>Payment complete — local stand-in</h1>
<p role="status">This payment has already been completed.</p>
<p><a href="${escapeHtml(back)}">Return to the shop</a></p>`,
    );
  }
  const back = session.cancel_url ? `<p><a href="${escapeHtml(session.cancel_url)}">Return to the shop</a></p>` : '';
  return layout(
    'Payment session expired — local stand-in',
    `<h1>Payment session expired — local stand-in</h1>
<p role="status">This payment session has expired. Start the checkout again from the shop.</p>
${back}`,
  );
}

export function notFoundPage(what: string): string {
  return layout('Not found — local stand-in', `<h1>Not found — local stand-in</h1><p role="status">${escapeHtml(what)}</p>`);
}

export interface OnboardingLinkValues {
  returnUrl: string;
  refreshUrl: string;
  link: string;
}

export function onboardingPage(account: Account, link: OnboardingLinkValues): string {
  const status = account.details_submitted
    ? '<p role="status">Onboarding is already complete for this account.</p>'
    : '<p>Pressing the button stands in for the seller filling in identity, bank account and terms: the account can then receive transfers.</p>';
  return layout(
    'Account onboarding — local stand-in',
    `<h1>Account onboarding — local stand-in</h1>
<p class="note">Nothing is verified: this page belongs to the local payment stand-in.</p>
<dl>
<dt>Account</dt><dd id="account-id">${escapeHtml(account.id)}</dd>
<dt>Email</dt><dd>${escapeHtml(account.email ?? '—')}</dd>
<dt>Payouts enabled</dt><dd id="payouts-enabled">${account.payouts_enabled ? 'yes' : 'no'}</dd>
</dl>
${status}
<form method="post" action="/connect/onboarding/${escapeHtml(account.id)}">
<input type="hidden" name="return_url" value="${escapeHtml(link.returnUrl)}">
<input type="hidden" name="refresh_url" value="${escapeHtml(link.refreshUrl)}">
<input type="hidden" name="link" value="${escapeHtml(link.link)}">
<button type="submit">Complete onboarding</button>
</form>
${link.returnUrl ? `<p class="muted"><a href="${escapeHtml(link.returnUrl)}">Leave without finishing</a></p>` : ''}`,
  );
}

export function indexPage(baseUrl: string): string {
  return layout(
    'Local payment stand-in',
    `<h1>Local payment stand-in</h1>
<p>Speaks the Stripe v1 REST API for Drabyard's development and tests. API base: <code>${escapeHtml(baseUrl)}/v1</code>.</p>
<p class="muted">Control endpoints live under <code>/__control/</code>; see the README beside the code.</p>`,
  );
}
