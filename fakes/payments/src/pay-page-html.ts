import { formatAmount } from './money.js';
import { TEST_CARDS } from './test-cards.js';
import type { CheckoutSession, LineItem } from './types.js';

/** The hosted checkout page: plain HTML with inline styles, no scripts, nothing fetched from elsewhere. */

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => `&#${ch.charCodeAt(0)};`);
}

// Fryline's palette (packages/ui/src/theme.css): plum ink on cream paper, a toasted-sugar accent.
// The page is a local stand-in, and its look says so: a striped "test" band, a receipt strip, a plum pill button.
const STYLE = `
:root { color-scheme: light; --ink: #2b1830; --plum: #3f2346; --plum-soft: #efe2ef; --muted: #6a5566; --line: #e2d2b8;
  --paper: #fbf6ec; --crumb: #f4e9d6; --sugar: #e5a85e; --sugar-ink: #8a4f17; --bad: #a1352a; --bad-bg: #f8e0da; }
* { box-sizing: border-box; }
body { margin: 0; font: 17px/1.5 Nunito, ui-sans-serif, system-ui, sans-serif; background: var(--paper); color: var(--ink); }
.band { background: repeating-linear-gradient(135deg, var(--sugar) 0 14px, #f0c48a 14px 28px); color: var(--ink); padding: .6rem 1rem; text-align: center; font-weight: 800; }
.band small { display: block; font-weight: 600; }
main { max-width: 34rem; margin: 1.75rem auto 3rem; padding: 0 1rem; }
h1 { font-size: 1.6rem; line-height: 1.2; margin: 0 0 .25rem; color: var(--plum); }
.lede { margin: 0 0 1.25rem; color: var(--muted); }
.receipt { background: #fff; border: 2px dashed var(--line); border-radius: 4px; padding: 1rem 1.25rem; }
.receipt h2 { margin: 0 0 .5rem; font-size: .95rem; letter-spacing: .06em; text-transform: uppercase; color: var(--sugar-ink); }
table { width: 100%; border-collapse: collapse; font-variant-numeric: tabular-nums; }
td { padding: .35rem 0; vertical-align: top; }
td.amount { text-align: right; white-space: nowrap; padding-left: 1rem; }
tr.total td { font-weight: 800; font-size: 1.1rem; border-top: 2px solid var(--ink); padding-top: .6rem; }
form.card { margin-top: 1.25rem; background: var(--crumb); border-radius: 20px; padding: 1.25rem; }
fieldset { border: 0; margin: 0; padding: 0; }
legend { font-weight: 800; font-size: 1.1rem; padding: 0; }
p { margin: .5rem 0; }
.muted { color: var(--muted); font-size: .95rem; }
label { display: block; font-weight: 700; margin: .9rem 0 .3rem; }
label .optional { font-weight: 400; color: var(--muted); }
input { width: 100%; font: inherit; padding: .65rem .8rem; border: 2px solid var(--line); border-radius: 12px; background: #fff; color: inherit; }
input:focus-visible { outline: 3px solid #d28a3c; outline-offset: 2px; }
.pair { display: grid; grid-template-columns: 1fr 1fr; gap: .75rem; }
button { display: block; width: 100%; margin-top: 1.25rem; font: inherit; font-weight: 800; padding: .8rem 1.2rem; border: 0; border-radius: 999px; background: var(--plum); color: var(--paper); cursor: pointer; }
button:focus-visible, a:focus-visible { outline: 3px solid #d28a3c; outline-offset: 2px; }
button.quiet { background: transparent; color: var(--plum); border: 2px solid #c9a9cf; margin-top: .75rem; }
.error { background: var(--bad-bg); color: var(--bad); border-left: 5px solid var(--bad); border-radius: 8px; padding: .6rem .8rem; margin: 1rem 0 0; font-weight: 700; }
a { color: var(--plum); font-weight: 700; }
.back { display: block; text-align: center; margin-top: 1.25rem; }
details { margin-top: 1.5rem; background: #fff; border: 1px solid var(--line); border-radius: 12px; padding: .75rem 1rem; }
summary { font-weight: 700; cursor: pointer; }
details li { margin: .2rem 0; }
code { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, monospace; }
`;

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)} · local test payments</title>
<style>${STYLE}</style>
</head>
<body>
<header class="band" role="note">Local test stand-in for card payments<small>Part of the shop's development set-up: no real card is charged and no money moves.</small></header>
<main>
${body}
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
  return `<section class="receipt" aria-labelledby="receipt-heading"><h2 id="receipt-heading">What this payment is for</h2><table>
${rows}
<tr class="total"><td>To pay</td><td class="amount">${escapeHtml(formatAmount(session.amount_total, session.currency))}</td></tr>
</table></section>`;
}

function backLink(session: CheckoutSession): string {
  return session.cancel_url ? `<a class="back" href="${escapeHtml(session.cancel_url)}">Don’t pay now: return to the shop</a>` : '';
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
<p class="lede">Enter one of the test card numbers below to see how the shop handles each outcome.</p>
${orderSummary(session, items)}
<form class="card" method="post" action="/pay/${escapeHtml(session.id)}" novalidate>
<fieldset><legend>Test card</legend>
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ''}
${email}
${field('cardNumber', 'Card number', values.cardNumber, 'inputmode="numeric" autocomplete="cc-number" placeholder="1234 1234 1234 1234" required')}
<div class="pair">
<div>${field('expiry', 'Expiry (MM/YY)', values.expiry, 'autocomplete="cc-exp" placeholder="MM/YY" required')}</div>
<div>${field('cvc', 'Security code (CVC, 3 digits)', undefined, 'inputmode="numeric" autocomplete="cc-csc" placeholder="123" required')}</div>
</div>
${field('name', 'Name', values.name, 'autocomplete="cc-name"', true)}
</fieldset>
<button type="submit">Pay ${escapeHtml(total)} with the test card</button>
</form>
${backLink(session)}
<details open><summary>Test card numbers and what each does</summary><ul>${testCards}</ul><p>Any future expiry date and any 3-digit code work.</p></details>`,
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
