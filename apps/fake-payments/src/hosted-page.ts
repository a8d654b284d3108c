import { TEST_CARDS } from './card-payment';
import type { CardField } from './card-payment';
import { escapeHtml } from './html';
import type { StoredSession } from './types';

const STYLE = `
  :root { color-scheme: light; --ink: #18262f; --muted: #53636d; --line: #c9d3d9; --accent: #0a5a78; --bad: #a4221b; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 16px/1.5 system-ui, sans-serif; color: var(--ink); background: #eef2f4; }
  .banner { margin: 0; padding: .6rem 1rem; background: #fff3c4; border-bottom: 2px solid #d8b43a; text-align: center; font-weight: 600; }
  main { max-width: 28rem; margin: 1.5rem auto; padding: 1.25rem; background: #fff; border: 1px solid var(--line); border-radius: .75rem; }
  h1 { font-size: 1.25rem; margin: 0 0 .75rem; }
  .items { list-style: none; margin: 0 0 .5rem; padding: 0; }
  .items li { display: flex; justify-content: space-between; gap: 1rem; padding: .25rem 0; }
  .total { display: flex; justify-content: space-between; font-weight: 700; font-size: 1.125rem; border-top: 1px solid var(--line); padding-top: .5rem; margin: 0 0 1rem; }
  label { display: block; font-weight: 600; margin: .75rem 0 .25rem; }
  .hint { display: block; font-weight: 400; color: var(--muted); font-size: .875rem; }
  input { width: 100%; font: inherit; padding: .65rem .75rem; border: 1px solid var(--line); border-radius: .5rem; }
  input:focus-visible { outline: 3px solid #7cc3de; outline-offset: 1px; }
  input[aria-invalid="true"] { border-color: var(--bad); }
  .row { display: grid; grid-template-columns: 1fr 1fr; gap: .75rem; }
  .error { color: var(--bad); font-weight: 600; margin: 1rem 0 0; }
  button { width: 100%; margin-top: 1.25rem; padding: .8rem; font: inherit; font-weight: 700; color: #fff; background: var(--accent); border: 0; border-radius: .5rem; cursor: pointer; }
  button:focus-visible { outline: 3px solid #7cc3de; outline-offset: 2px; }
  .cancel { display: block; text-align: center; margin-top: 1rem; color: var(--accent); }
  details { margin-top: 1.25rem; color: var(--muted); font-size: .9rem; }
  table { border-collapse: collapse; width: 100%; margin-top: .5rem; }
  td { padding: .2rem .25rem; border-top: 1px solid var(--line); }
  code { font-size: .95em; }
`;

/** Formats integer minor units in the currency's own number of decimals, e.g. 5000 eur → €50.00. */
export function formatAmount(amountMinor: number, currency: string): string {
  const format = new Intl.NumberFormat('en', {
    style: 'currency',
    currency: currency.toUpperCase(),
  });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(amountMinor / 10 ** digits);
}

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)} · TEST payment page</title>
<style>${STYLE}</style>
</head>
<body>
<p class="banner" role="note">TEST payment page of the local fake payment provider. No real card is charged and no money moves.</p>
<main>${body}</main>
</body>
</html>`;
}

export interface PayPageInput {
  stored: StoredSession;
  error?: { message: string; field?: CardField };
  values?: { cardNumber: string; expiry: string };
}

/** The card form for an open session, optionally with an error tied to the field at fault. */
export function renderPayPage({ stored, error, values }: PayPageInput): string {
  const { session, lineItems } = stored;
  const total = formatAmount(session.amount_total, session.currency);
  const items = lineItems
    .map(
      (li) =>
        `<li><span>${escapeHtml(li.description)}${li.quantity > 1 ? ` × ${li.quantity}` : ''}</span><span>${escapeHtml(formatAmount(li.amount_total, li.currency))}</span></li>`,
    )
    .join('');
  const invalid = (field: CardField) =>
    error?.field === field ? ' aria-invalid="true" aria-describedby="pay-error"' : '';
  const errorBlock = error
    ? `<p id="pay-error" class="error" role="alert">${escapeHtml(error.message)}</p>`
    : '';
  const cancel = session.cancel_url
    ? `<a class="cancel" href="${escapeHtml(session.cancel_url)}">Cancel and go back</a>`
    : '';
  const cards = TEST_CARDS.map(
    (c) =>
      `<tr><td><code>${c.number.replace(/(\d{4})(?=\d)/g, '$1 ')}</code></td><td>${escapeHtml(c.label)}</td></tr>`,
  ).join('');
  const body = `<h1>Pay ${escapeHtml(total)}</h1>
<ul class="items" aria-label="What you are paying for">${items}</ul>
<p class="total"><span>Total</span><span>${escapeHtml(total)}</span></p>
<form method="post" action="/pay/${encodeURIComponent(session.id)}" novalidate>
  <label for="card_number">Card number</label>
  <input id="card_number" name="card_number" inputmode="numeric" autocomplete="cc-number" placeholder="4242 4242 4242 4242" value="${escapeHtml(values?.cardNumber ?? '')}" required${invalid('card_number')}>
  <div class="row">
    <div>
      <label for="expiry">Expiry <span class="hint">MM / YY</span></label>
      <input id="expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" placeholder="12 / 34" value="${escapeHtml(values?.expiry ?? '')}" required${invalid('expiry')}>
    </div>
    <div>
      <label for="cvc">CVC <span class="hint">3 or 4 digits</span></label>
      <input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="123" required${invalid('cvc')}>
    </div>
  </div>
  ${errorBlock}
  <button type="submit">Pay ${escapeHtml(total)}</button>
</form>
${cancel}
<details open>
  <summary>Test card numbers</summary>
  <p>Any future expiry date and any 3-digit CVC work.</p>
  <table><tbody>${cards}</tbody></table>
</details>`;
  return layout(`Pay ${total}`, body);
}

/** The page for a session that can no longer be paid. */
export function renderClosedPage(stored: StoredSession, successUrl: string | null): string {
  const { session } = stored;
  if (session.status === 'complete') {
    const link = successUrl
      ? `<p><a class="cancel" href="${escapeHtml(successUrl)}">Continue</a></p>`
      : '';
    return layout(
      'Already paid',
      `<h1>This payment is complete</h1><p>${escapeHtml(formatAmount(session.amount_total, session.currency))} was paid. Nothing more to do here.</p>${link}`,
    );
  }
  const back = session.cancel_url
    ? `<p><a class="cancel" href="${escapeHtml(session.cancel_url)}">Go back</a></p>`
    : '';
  return layout(
    'Session expired',
    `<h1>This checkout session has expired</h1><p>Start the payment again from the site to get a new one.</p>${back}`,
  );
}

/** The page for an unknown session id. */
export function renderUnknownSession(): string {
  return layout(
    'Not found',
    '<h1>Checkout session not found</h1><p>The link may be mistyped, or the local fake was reset.</p>',
  );
}
