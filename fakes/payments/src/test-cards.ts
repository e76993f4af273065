import type { CardDetails } from './types.js';

/** What the card network answers for a card number. */
export type CardBehaviour =
  | { kind: 'approve' }
  | { kind: 'decline'; code: string; declineCode: string; message: string }
  | { kind: 'authenticate' };

export interface TestCard {
  number: string;
  outcome: string;
  behaviour: CardBehaviour;
}

function decline(code: string, declineCode: string, message: string): CardBehaviour {
  return { kind: 'decline', code, declineCode, message };
}

/** The published test card numbers and what each one does. */
export const TEST_CARDS: readonly TestCard[] = [
  { number: '4242424242424242', outcome: 'Succeeds', behaviour: { kind: 'approve' } },
  {
    number: '4000000000000002',
    outcome: 'Declined (generic decline)',
    behaviour: decline('card_declined', 'generic_decline', 'Your card was declined.'),
  },
  {
    number: '4000000000009995',
    outcome: 'Declined (insufficient funds)',
    behaviour: decline('card_declined', 'insufficient_funds', 'Your card has insufficient funds.'),
  },
  {
    number: '4000000000000069',
    outcome: 'Declined (expired card)',
    behaviour: decline('expired_card', 'expired_card', 'Your card has expired.'),
  },
  {
    number: '4000000000000127',
    outcome: 'Declined (incorrect CVC)',
    behaviour: decline('incorrect_cvc', 'incorrect_cvc', "Your card's security code is incorrect."),
  },
  {
    number: '4000000000000119',
    outcome: 'Declined (processing error)',
    behaviour: decline(
      'processing_error',
      'processing_error',
      'An error occurred while processing your card. Try again in a little bit.',
    ),
  },
  { number: '4000002500003155', outcome: 'Asks for an extra confirmation step', behaviour: { kind: 'authenticate' } },
];

/** Any other well-formed number is refused: only the test numbers work here. */
const UNKNOWN_CARD = decline(
  'card_declined',
  'test_mode_live_card',
  'Your card was declined. Only published test card numbers work in this test checkout.',
);

export function behaviourOf(number: string): CardBehaviour {
  return TEST_CARDS.find((card) => card.number === number)?.behaviour ?? UNKNOWN_CARD;
}

export interface CardInput {
  cardNumber?: string;
  expiry?: string;
  cvc?: string;
}

export interface CardFormError {
  code: string;
  message: string;
}

export type ParsedCard = { ok: true; number: string; details: CardDetails } | { ok: false; error: CardFormError };

function luhnValid(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let digit = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      digit *= 2;
      if (digit > 9) digit -= 9;
    }
    sum += digit;
  }
  return sum % 10 === 0;
}

function brandOf(number: string): string {
  if (number.startsWith('4')) return 'visa';
  if (/^(5[1-5]|2[2-7])/.test(number)) return 'mastercard';
  if (/^3[47]/.test(number)) return 'amex';
  if (/^(6011|65)/.test(number)) return 'discover';
  return 'unknown';
}

const fail = (code: string, message: string): ParsedCard => ({ ok: false, error: { code, message } });

/**
 * Checks the card form the way a checkout page does before anything reaches
 * the card network: number length and check digit, an `MM/YY` expiry that is
 * not in the past (on the fake's clock), a 3–4 digit security code.
 */
export function parseCard(input: CardInput, nowSeconds: number): ParsedCard {
  const number = (input.cardNumber ?? '').replace(/[\s-]/g, '');
  if (number === '') return fail('incomplete_number', 'Your card number is incomplete.');
  if (!/^\d{12,19}$/.test(number) || !luhnValid(number)) return fail('incorrect_number', 'Your card number is incorrect.');

  const expiry = (input.expiry ?? '').trim();
  if (expiry === '') return fail('incomplete_expiry', "Your card's expiration date is incomplete.");
  const match = /^(\d{1,2})\s*\/\s*(\d{2}|\d{4})$/.exec(expiry);
  if (!match) return fail('invalid_expiry', "Your card's expiration date should look like MM/YY.");
  const month = Number(match[1]);
  const year = match[2]!.length === 2 ? 2000 + Number(match[2]) : Number(match[2]);
  if (month < 1 || month > 12) return fail('invalid_expiry_month', "Your card's expiration month is invalid.");
  const now = new Date(nowSeconds * 1000);
  const nowMonths = now.getUTCFullYear() * 12 + now.getUTCMonth();
  if (year * 12 + (month - 1) < nowMonths) return fail('invalid_expiry_year', "Your card's expiration date is in the past.");

  const cvc = (input.cvc ?? '').trim();
  if (!/^\d{3,4}$/.test(cvc)) return fail('incomplete_cvc', "Your card's security code is incomplete.");

  return {
    ok: true,
    number,
    details: { brand: brandOf(number), country: 'US', exp_month: month, exp_year: year, funding: 'credit', last4: number.slice(-4) },
  };
}
