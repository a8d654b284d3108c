import { TEST_CARDS } from './card-payment';
import type { CardField } from './card-payment';
import escapeHtml from 'escape-html';
import type { StoredSession } from './types';

// Rodewise's own palette and type (apps/web/src/styles/index.css): ink on sand, the signal orange for the
// one action, kelp for done, flare for a problem. The page's CSP loads no fonts, so the family falls back
// to the system's sans-serif unless Merriweather Sans is installed.
const STYLE = `
  :root { color-scheme: light; --ink: #13293d; --ink-soft: #4d5d6c; --sand: #f7f1e6; --sand-50: #fcf9f3; --line: #d9cdb6; --signal: #b8440f; --signal-dark: #9a3a0c; --kelp: #2d6a3e; --kelp-50: #e8f1e9; --flare: #b3261e; --flare-50: #fbe9e7; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 16px/1.55 'Merriweather Sans', ui-sans-serif, system-ui, sans-serif; color: var(--ink); background: var(--sand); }
  .strip { margin: 0; padding: .55rem 1rem; background: var(--ink); color: var(--sand-50); font-size: .9rem; }
  .strip strong { color: #fff; }
  main { max-width: 30rem; margin: 1.25rem auto 2rem; padding: 0 1rem; }
  .sheet { background: var(--sand-50); border: 2px solid var(--ink); border-radius: .5rem; padding: 1.25rem; }
  .club { margin: 0; font-size: .8rem; font-weight: 700; letter-spacing: .06em; text-transform: uppercase; color: var(--ink-soft); }
  h1 { font-size: 1.4rem; margin: .15rem 0 .75rem; }
  h2 { font-size: 1rem; margin: 1.25rem 0 .5rem; }
  .bill { margin: 0; padding: 0; border-top: 1px dashed var(--line); }
  .bill div { display: flex; justify-content: space-between; gap: 1rem; padding: .35rem 0; border-bottom: 1px dashed var(--line); }
  .bill dt, .bill dd { margin: 0; }
  .bill .sum { font-weight: 700; font-size: 1.1rem; border-bottom: 0; }
  .quick { display: grid; gap: .5rem; }
  .quick form { margin: 0; }
  label { display: block; font-weight: 700; margin: .75rem 0 .25rem; }
  .hint { display: block; font-weight: 400; color: var(--ink-soft); font-size: .85rem; }
  input { width: 100%; font: inherit; padding: .6rem .7rem; border: 2px solid var(--line); border-radius: .375rem; background: #fff; color: var(--ink); }
  input:focus-visible, button:focus-visible, a:focus-visible { outline: 3px solid var(--signal); outline-offset: 2px; }
  input[aria-invalid="true"] { border-color: var(--flare); }
  .pair { display: grid; grid-template-columns: 1fr 1fr; gap: .75rem; }
  .problem { margin: 1rem 0 0; padding: .6rem .75rem; border-left: 4px solid var(--flare); background: var(--flare-50); color: var(--flare); font-weight: 700; }
  .done { padding: .6rem .75rem; border-left: 4px solid var(--kelp); background: var(--kelp-50); color: var(--kelp); font-weight: 700; }
  button { width: 100%; min-height: 2.75rem; padding: .65rem .9rem; font: inherit; font-weight: 700; border-radius: .375rem; cursor: pointer; }
  .go { margin-top: 1.1rem; color: #fff; background: var(--signal); border: 2px solid var(--signal); }
  .go:hover { background: var(--signal-dark); }
  .alt { color: var(--ink); background: #fff; border: 2px solid var(--ink); text-align: left; }
  .back { display: inline-block; margin-top: 1rem; color: var(--ink); font-weight: 700; }
  .small { color: var(--ink-soft); font-size: .85rem; }
  code { font-size: .95em; }
`;

/** Who the page is for: the club's name and region, passed by the API in the session's metadata. */
interface PageContext {
  club: string;
  region: string;
}

const DEFAULT_REGION = 'en-GB';

function contextOf(stored: StoredSession): PageContext {
  const { metadata } = stored.session;
  let region = DEFAULT_REGION;
  try {
    region = Intl.getCanonicalLocales(metadata.club_region ?? DEFAULT_REGION)[0] ?? DEFAULT_REGION;
  } catch {
    region = DEFAULT_REGION;
  }
  return { club: metadata.club_name ?? 'your club', region };
}

/**
 * Formats integer minor units in the currency's own number of decimals, in the club's region:
 * 5000 eur → "€50.00" (en-GB), "50,00 €" (de-DE); 5000 jpy → "¥5,000".
 */
export function formatAmount(
  amountMinor: number,
  currency: string,
  region = DEFAULT_REGION,
): string {
  const code = currency.toUpperCase();
  const digits =
    new Intl.NumberFormat('en', { style: 'currency', currency: code }).resolvedOptions()
      .maximumFractionDigits ?? 2;
  return new Intl.NumberFormat(region, { style: 'currency', currency: code }).format(
    amountMinor / 10 ** digits,
  );
}

const TITLE = 'Practice payment — no money moves';

function layout(heading: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${TITLE} · ${escapeHtml(heading)}</title>
<style>${STYLE}</style>
</head>
<body>
<p class="strip" role="note"><strong>${TITLE}.</strong> This page stands in for the card service while Rodewise runs on a test machine. No card is charged.</p>
<main>${body}</main>
</body>
</html>`;
}

export interface PayPageInput {
  stored: StoredSession;
  error?: { message: string; field?: CardField };
  values?: { cardNumber: string; expiry: string };
}

/** Expiry and code the one-press choices send: any future month and any three digits do. */
const QUICK_EXPIRY = '12 / 40';
const QUICK_CVC = '123';

const QUICK_LABELS: Record<string, string> = {
  '4242424242424242': 'Use the practice card that goes through',
  '4000000000000002': 'Try a card the bank turns down',
  '4000000000009995': 'Try a card without enough money on it',
};

const spaced = (number: string) => number.replace(/(\d{4})(?=\d)/g, '$1 ');

/** The card form for an open session, optionally with the problem tied to the field at fault. */
export function renderPayPage({ stored, error, values }: PayPageInput): string {
  const { session, lineItems } = stored;
  const ctx = contextOf(stored);
  const money = (minor: number) => formatAmount(minor, session.currency, ctx.region);
  const total = money(session.amount_total);
  const action = `/pay/${encodeURIComponent(session.id)}`;
  const lines = lineItems
    .map(
      (li) =>
        `<div><dt>${escapeHtml(li.description)}${li.quantity > 1 ? ` × ${li.quantity}` : ''}</dt><dd>${escapeHtml(money(li.amount_total))}</dd></div>`,
    )
    .join('');
  const invalid = (field: CardField) =>
    error?.field === field ? ' aria-invalid="true" aria-describedby="pay-problem"' : '';
  const problem = error
    ? `<p id="pay-problem" class="problem" role="alert">${escapeHtml(error.message)}</p>`
    : '';
  const back = session.cancel_url
    ? `<a class="back" href="${escapeHtml(session.cancel_url)}">Back to ${escapeHtml(ctx.club)} without paying</a>`
    : '';
  const quick = TEST_CARDS.map(
    (c) => `<form method="post" action="${action}">
    <input type="hidden" name="card_number" value="${c.number}">
    <input type="hidden" name="expiry" value="${QUICK_EXPIRY}">
    <input type="hidden" name="cvc" value="${QUICK_CVC}">
    <button class="alt" type="submit">${escapeHtml(QUICK_LABELS[c.number] ?? c.label)} <span class="hint">${spaced(c.number)}</span></button>
  </form>`,
  ).join('');
  const body = `<div class="sheet">
<p class="club">${escapeHtml(ctx.club)}</p>
<h1>Practice payment of ${escapeHtml(total)}</h1>
<dl class="bill" aria-label="What this payment covers">${lines}<div class="sum"><dt>To pay</dt><dd>${escapeHtml(total)}</dd></div></dl>
${problem}
<h2>One press</h2>
<div class="quick">${quick}</div>
<h2>Or type a practice card</h2>
<form method="post" action="${action}" novalidate>
  <label for="card_number">Card number <span class="hint">one of the practice numbers above</span></label>
  <input id="card_number" name="card_number" inputmode="numeric" autocomplete="cc-number" value="${escapeHtml(values?.cardNumber ?? '')}" required${invalid('card_number')}>
  <div class="pair">
    <div>
      <label for="expiry">Expiry <span class="hint">month / year, e.g. 12 / 40</span></label>
      <input id="expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" value="${escapeHtml(values?.expiry ?? '')}" required${invalid('expiry')}>
    </div>
    <div>
      <label for="cvc">Security code <span class="hint">3 or 4 digits</span></label>
      <input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" required${invalid('cvc')}>
    </div>
  </div>
  <button class="go" type="submit">Pay ${escapeHtml(total)}</button>
</form>
<p class="small">Any month still to come and any three digits work with the practice numbers.</p>
${back}
</div>`;
  return layout(total, body);
}

/** The page for a session that can no longer be paid. */
export function renderClosedPage(stored: StoredSession, successUrl: string | null): string {
  const { session } = stored;
  const ctx = contextOf(stored);
  if (session.status === 'complete') {
    const link = successUrl
      ? `<p><a class="back" href="${escapeHtml(successUrl)}">Back to ${escapeHtml(ctx.club)}</a></p>`
      : '';
    return layout(
      'Already paid',
      `<div class="sheet"><p class="club">${escapeHtml(ctx.club)}</p><h1>Already paid</h1><p class="done">${escapeHtml(formatAmount(session.amount_total, session.currency, ctx.region))} went through on this practice payment. There is nothing more to pay here.</p>${link}</div>`,
    );
  }
  const back = session.cancel_url
    ? `<p><a class="back" href="${escapeHtml(session.cancel_url)}">Back to ${escapeHtml(ctx.club)}</a></p>`
    : '';
  return layout(
    'Timed out',
    `<div class="sheet"><p class="club">${escapeHtml(ctx.club)}</p><h1>This payment page has timed out</h1><p>Nothing was charged. Start again from the dues page to get a fresh one.</p>${back}</div>`,
  );
}

/** The page for an unknown session id. */
export function renderUnknownSession(): string {
  return layout(
    'Not found',
    '<div class="sheet"><h1>No payment at this address</h1><p>The link may be mistyped, or the practice card service was restarted and forgot it. Start again from the dues page.</p></div>',
  );
}
