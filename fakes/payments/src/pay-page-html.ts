import { formatAmount } from './money.js';
import { TEST_CARDS } from './test-cards.js';
import type { CheckoutSession, LineItem } from './types.js';

/** The hosted checkout page: plain HTML with inline styles, no scripts, nothing fetched from elsewhere. */

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => `&#${ch.charCodeAt(0)};`);
}

const STYLE = `
:root { color-scheme: light; --ink: #23201b; --muted: #6a6358; --line: #e6e0d5; --paper: #f8f5ef;
  --accent: #2d5b4f; --bad: #9d2f27; --bad-bg: #fbeeec; --note: #fff6dc; }
* { box-sizing: border-box; }
body { margin: 0; font: 16px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; background: var(--paper); color: var(--ink); }
main { max-width: 30rem; margin: 2.5rem auto; padding: 0 1rem; }
.panel { background: #fff; border: 1px solid var(--line); border-radius: 14px; padding: 1.5rem; box-shadow: 0 1px 3px rgba(35, 32, 27, .06); }
.test-note { font-size: .8rem; background: var(--note); border: 1px solid #ead89f; border-radius: 8px; padding: .4rem .75rem; margin: 0 0 1.25rem; }
h1 { font-size: 1.3rem; margin: 0 0 1rem; }
h2 { font-size: 1rem; margin: 1.5rem 0 .25rem; }
p { margin: .5rem 0; }
.muted { color: var(--muted); font-size: .9rem; }
table { width: 100%; border-collapse: collapse; }
td { padding: .45rem 0; border-bottom: 1px solid var(--line); vertical-align: top; }
td.amount { text-align: right; white-space: nowrap; padding-left: 1rem; }
tr.total td { font-weight: 650; border-bottom: 0; padding-top: .8rem; }
label { display: block; font-size: .875rem; font-weight: 600; margin: .9rem 0 .3rem; }
label .optional { font-weight: 400; color: var(--muted); }
input { width: 100%; font: inherit; padding: .6rem .7rem; border: 1px solid #cdc5b7; border-radius: 8px; background: #fff; color: inherit; }
input:focus { outline: 2px solid var(--accent); outline-offset: 1px; border-color: var(--accent); }
.pair { display: grid; grid-template-columns: 1fr 1fr; gap: .75rem; }
button { width: 100%; margin-top: 1.25rem; font: inherit; font-weight: 650; padding: .75rem; border: 0; border-radius: 8px; background: var(--accent); color: #fff; cursor: pointer; }
button.quiet { background: #fff; color: var(--ink); border: 1px solid #cdc5b7; margin-top: .75rem; }
.error { background: var(--bad-bg); color: var(--bad); border: 1px solid #eec4bf; border-radius: 8px; padding: .6rem .75rem; margin: 1rem 0 0; }
a { color: var(--accent); }
.back { display: block; text-align: center; margin-top: 1rem; }
details { margin-top: 1.25rem; font-size: .85rem; color: var(--muted); }
details li { margin: .15rem 0; }
code { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, monospace; }
`;

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
<div class="panel">
<p class="test-note">Test checkout — no real card is charged and no money moves.</p>
${body}
</div>
</main>
</body>
</html>`;
}

function orderSummary(session: CheckoutSession, items: LineItem[]): string {
  const rows = items
    .map(
      (item) =>
        `<tr><td>${escapeHtml(item.description)} <span class="muted">× ${item.quantity}</span></td>` +
        `<td class="amount">${escapeHtml(formatAmount(item.amount_total, item.currency))}</td></tr>`,
    )
    .join('\n');
  return `<table aria-label="Order summary">
${rows}
<tr class="total"><td>Total</td><td class="amount">${escapeHtml(formatAmount(session.amount_total, session.currency))}</td></tr>
</table>`;
}

function backLink(session: CheckoutSession): string {
  return session.cancel_url ? `<a class="back" href="${escapeHtml(session.cancel_url)}">Cancel and go back</a>` : '';
}

export interface CardFormValues {
  cardNumber?: string;
  expiry?: string;
  name?: string;
  email?: string;
}

function field(name: string, label: string, value: string | undefined, attrs: string, optional = false): string {
  return `<label for="${name}">${label}${optional ? ' <span class="optional">(optional)</span>' : ''}</label>
<input id="${name}" name="${name}" value="${escapeHtml(value ?? '')}" ${attrs}>`;
}

export function checkoutPage(session: CheckoutSession, items: LineItem[], values: CardFormValues = {}, error?: string): string {
  const total = formatAmount(session.amount_total, session.currency);
  const email = session.customer_email
    ? `<p class="muted">Receipt to ${escapeHtml(session.customer_email)}</p>`
    : field('email', 'Email', values.email, 'type="email" autocomplete="email"', true);
  const testCards = TEST_CARDS.map((card) => `<li><code>${card.number.replace(/(\d{4})(?=\d)/g, '$1 ')}</code> — ${escapeHtml(card.outcome)}</li>`).join('');
  return page(
    `Pay ${total}`,
    `<h1>Pay ${escapeHtml(total)}</h1>
${orderSummary(session, items)}
<form method="post" action="/pay/${escapeHtml(session.id)}" novalidate>
<h2>Card details</h2>
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ''}
${email}
${field('cardNumber', 'Card number', values.cardNumber, 'inputmode="numeric" autocomplete="cc-number" placeholder="1234 1234 1234 1234" required')}
<div class="pair">
<div>${field('expiry', 'Expiry (MM/YY)', values.expiry, 'autocomplete="cc-exp" placeholder="MM/YY" required')}</div>
<div>${field('cvc', 'Security code', undefined, 'inputmode="numeric" autocomplete="cc-csc" placeholder="CVC" required')}</div>
</div>
${field('name', 'Name on card', values.name, 'autocomplete="cc-name"', true)}
<button type="submit">Pay ${escapeHtml(total)}</button>
</form>
${backLink(session)}
<details><summary>Test card numbers</summary><ul>${testCards}</ul><p>Any future expiry date and any 3-digit code work.</p></details>`,
  );
}

export function confirmationPage(session: CheckoutSession): string {
  const total = formatAmount(session.amount_total, session.currency);
  const action = `/pay/${escapeHtml(session.id)}/confirm`;
  return page(
    'Confirm your payment',
    `<h1>Confirm your payment</h1>
<p>Your card issuer asks you to confirm this payment of <strong>${escapeHtml(total)}</strong>.</p>
<p class="muted">This is the extra confirmation step of the test card. Choose how it ends.</p>
<form method="post" action="${action}"><input type="hidden" name="result" value="complete"><button type="submit">Confirm payment</button></form>
<form method="post" action="${action}"><input type="hidden" name="result" value="fail"><button type="submit" class="quiet">Fail confirmation</button></form>`,
  );
}

export function noticePage(title: string, message: string, link?: { href: string; label: string }): string {
  return page(
    title,
    `<h1>${escapeHtml(title)}</h1>
<p>${escapeHtml(message)}</p>
${link ? `<a class="back" href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a>` : ''}`,
  );
}
