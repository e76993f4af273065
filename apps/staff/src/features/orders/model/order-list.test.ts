import { describe, expect, it } from 'vitest';
import type { StaffOrderView } from '@fryline/schemas';
import { compactCode, foldText, groupByWindow, matchesOrder, summariseOrders } from './order-list';

const early = { id: 'w1', startsAt: '2026-06-13T16:00:00Z', endsAt: '2026-06-13T17:00:00Z' };
const late = { id: 'w2', startsAt: '2026-06-13T17:00:00Z', endsAt: '2026-06-13T18:00:00Z' };

function order(id: string, over: Partial<StaffOrderView> = {}): StaffOrderView {
  return {
    id,
    status: 'paid',
    customer: { name: 'Wren Halloway', email: 'wren.h@example.test' },
    pickupCode: 'KM7-X3P',
    pickupWindow: early,
    totalCents: 2400,
    refundedCents: 0,
    currency: 'usd',
    paidAt: '2026-06-10T15:00:00Z',
    rings: 12,
    holes: 0,
    boxes: [],
    priceLines: [],
    ...over,
  };
}

describe('finding an order by name, e-mail or pickup code (common practice, no source)', () => {
  const wren = order('a');

  it.each(['', '   ', 'wren', 'HALLOWAY', 'halloway wren', 'wren.h@', 'example.test', 'km7x3p', 'km7-x3p', 'X3P', 'k m 7'])(
    '"%s" finds Wren Halloway (KM7-X3P)',
    (query) => {
      expect(matchesOrder(wren, query)).toBe(true);
    },
  );

  it.each(['wrenn', 'holloway', 'X3Q', 'wren smith'])('"%s" does not', (query) => {
    expect(matchesOrder(wren, query)).toBe(false);
  });

  it('ignores accents both ways: é is e + U+0301 once decomposed (Unicode Standard Annex #15, NFD)', () => {
    const renee = order('b', { customer: { name: 'Renée Ošťádal', email: 'rosta@example.test' } });
    expect(foldText('Renée')).toBe('renee');
    expect(matchesOrder(renee, 'renee ostadal')).toBe(true);
    expect(matchesOrder(renee, 'RENÉE')).toBe(true);
    expect(matchesOrder(order('c'), 'wrén')).toBe(true);
  });

  it('an unpaid hold has no pickup code yet, so only its name finds it', () => {
    const held = order('d', { status: 'held', pickupCode: null, paidAt: null });
    expect(matchesOrder(held, 'km7')).toBe(false);
    expect(matchesOrder(held, 'wren')).toBe(true);
  });

  it('reads a code typed with spaces or dashes as the code itself', () => {
    expect(compactCode(' km7 - x3p ')).toBe('KM7X3P');
  });
});

describe('orders under their pickup windows', () => {
  it('lists every window, earliest first, each with its own orders in the order given', () => {
    const a = order('a', { pickupWindow: late });
    const b = order('b');
    const c = order('c', { pickupWindow: late });
    const groups = groupByWindow([late, early], [a, b, c]);
    expect(groups.map((g) => [g.window.id, g.orders.map((o) => o.id)])).toEqual([
      ['w1', ['b']],
      ['w2', ['a', 'c']],
    ]);
  });

  it('keeps a window with no orders, and adds one only an order still names', () => {
    const gone = { id: 'w0', startsAt: '2026-06-13T15:00:00Z', endsAt: '2026-06-13T16:00:00Z' };
    const groups = groupByWindow([early, late], [order('a', { pickupWindow: gone })]);
    expect(groups.map((g) => [g.window.id, g.orders.length])).toEqual([
      ['w0', 1],
      ['w1', 0],
      ['w2', 0],
    ]);
  });
});

describe('the bake day’s order summary', () => {
  it('counts orders by status in lifecycle order and adds up money paid and refunded', () => {
    const summary = summariseOrders([
      order('a', { status: 'collected' }),
      order('b'),
      order('c', { status: 'refunded', refundedCents: 2400 }),
      order('d', { status: 'held', paidAt: null, totalCents: 1300 }),
      order('e', { refundedCents: 450 }),
    ]);
    expect(summary.byStatus).toEqual([
      { status: 'held', count: 1 },
      { status: 'paid', count: 2 },
      { status: 'collected', count: 1 },
      { status: 'refunded', count: 1 },
    ]);
    expect(summary.paidCents).toBe(4 * 2400);
    expect(summary.refundedCents).toBe(2400 + 450);
  });
});
