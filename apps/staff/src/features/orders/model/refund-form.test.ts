import { describe, expect, it } from 'vitest';
import type { StaffOrderView } from '@fryline/schemas';
import { refundableCents, refundFormDefaults, refundFormSchema } from './refund-form';

const order = (over: Partial<StaffOrderView>) => ({
  status: 'paid' as const,
  paidAt: '2026-06-10T15:00:00Z',
  totalCents: 2400,
  refundedCents: 0,
  ...over,
});

describe('which orders have money left to refund', () => {
  it.each([
    ['paid', 0, 2400],
    ['collected', 0, 2400],
    ['no_show', 0, 2400],
    ['cancelled', 900, 1500],
    ['refunded', 1000, 1400],
    ['refunded', 2400, 0],
    ['paid', 2400, 0],
  ] as const)('a %s order with %i cents refunded has the rest left (total − refunded, common practice, no source)', (status, refunded, left) => {
    expect(refundableCents(order({ status, refundedCents: refunded }))).toBe(left);
  });

  it('an unpaid hold, a lapsed hold or an order never paid has nothing to refund', () => {
    expect(refundableCents(order({ status: 'held', paidAt: null }))).toBe(0);
    expect(refundableCents(order({ status: 'expired', paidAt: null }))).toBe(0);
    expect(refundableCents(order({ status: 'cancelled', paidAt: null }))).toBe(0);
  });
});

describe('the refund form (amounts in dollars, ISO 4217: 2 decimal places for USD)', () => {
  const schema = refundFormSchema(1900);

  it('starts as a full refund of what is left, $19.00', () => {
    expect(refundFormDefaults(1900)).toEqual({ mode: 'full', amount: '19.00', reason: '' });
    expect(schema.parse({ ...refundFormDefaults(1900), reason: ' Box dropped ' })).toEqual({
      amountCents: 1900,
      reason: 'Box dropped',
    });
  });

  it('turns a part of $4.50 into 450 cents', () => {
    expect(schema.parse({ mode: 'part', amount: '4.5', reason: 'One ring missing' })).toEqual({
      amountCents: 450,
      reason: 'One ring missing',
    });
  });

  it('says what is wrong beside each field, the amount and the reason at once', () => {
    const result = schema.safeParse({ mode: 'part', amount: '19.01', reason: '   ' });
    expect(result.success).toBe(false);
    const byField = Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join('.'), i.message]));
    expect(byField).toEqual({ amount: 'At most $19.00 is left to refund', reason: 'Give a reason' });
  });

  it.each([
    ['0', 'The amount must be at least $0.01'],
    ['4,50', 'Write the amount as a number, like 4.50'],
    ['-3', 'Write the amount as a number, like 4.50'],
    ['', 'Write the amount as a number, like 4.50'],
  ])('refuses the amount "%s"', (amount, message) => {
    const result = schema.safeParse({ mode: 'part', amount, reason: 'Late' });
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['amount', message]]);
  });
});
