import type { TaxSetting } from './bake-days.js';
import { roundHalfUp } from '@fryline/production';
import { boxLabel, type BoxSize } from './boxes.js';
import { formatCents } from './money.js';

export interface PricedBoxInput {
  boxPriceCents: number;
  items: Array<{ surchargeCents: number; quantity: number }>;
}

export interface OrderPrice {
  boxesCents: number[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
}

/**
 * The one price function for an order: each box costs its box price plus
 * every item's surcharge × quantity; tax is worked out once on the subtotal
 * and rounded half up to the cent.
 * - `added`: total = subtotal + round(subtotal × rate).
 * - `included`: total = subtotal; the tax inside it is
 *   subtotal − round(subtotal ÷ (1 + rate)).
 */
export function priceOrder(boxes: PricedBoxInput[], tax: TaxSetting): OrderPrice {
  const boxesCents = boxes.map(
    (box) => box.boxPriceCents + box.items.reduce((sum, item) => sum + item.surchargeCents * item.quantity, 0),
  );
  const subtotalCents = boxesCents.reduce((a, b) => a + b, 0);
  const rate = tax.rateBasisPoints;
  if (tax.mode === 'added') {
    const taxCents = roundHalfUp(subtotalCents * rate, 10_000);
    return { boxesCents, subtotalCents, taxCents, totalCents: subtotalCents + taxCents };
  }
  const net = roundHalfUp(subtotalCents * 10_000, 10_000 + rate);
  return { boxesCents, subtotalCents, taxCents: subtotalCents - net, totalCents: subtotalCents };
}

/** One line of an order's bill: what it is, and what it adds to the total. */
export interface PriceLine {
  kind: 'box' | 'surcharge' | 'tax';
  label: string;
  cents: number;
  /** Which box (0-based) a box or surcharge line belongs to. */
  box?: number;
}

export interface PricedOrder {
  boxes: Array<{ size: BoxSize; priceCents: number; items: Array<{ name: string; quantity: number; surchargeCents: number }> }>;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
}

export interface OrderBill {
  /** Lines whose cents add up to `totalCents`. */
  lines: PriceLine[];
  totalCents: number;
  /** Tax already inside the prices (shown as a note, not added), or null. */
  includedTaxCents: number | null;
}

/**
 * The one place that says what an order's total is made of, for the order
 * page, the e-mails and the staff list alike: each box's price, then each
 * flavour surcharge (quantity × surcharge), then the tax as its own line when
 * it is added on top. The lines always sum to the total; an order whose
 * stored figures would not (never written by priceOrder) is an error, not a
 * silently wrong bill. Amounts in labels are in `currency` (the shop's).
 */
export function orderBill(order: PricedOrder, currency?: string): OrderBill {
  const lines: PriceLine[] = [];
  order.boxes.forEach((box, index) => {
    lines.push({ kind: 'box', label: boxLabel(box.size), cents: box.priceCents, box: index });
    for (const item of box.items) {
      if (item.surchargeCents === 0) continue;
      const each = formatCents(item.surchargeCents, currency);
      lines.push({ kind: 'surcharge', label: `${item.quantity} × ${item.name} (+${each} each)`, cents: item.surchargeCents * item.quantity, box: index });
    }
  });
  const taxAdded = order.taxCents > 0 && order.totalCents === order.subtotalCents + order.taxCents;
  if (taxAdded) lines.push({ kind: 'tax', label: 'Tax', cents: order.taxCents });
  const sum = lines.reduce((s, l) => s + l.cents, 0);
  if (sum !== order.totalCents) throw new Error(`orderBill: lines add up to ${sum} but the order's total is ${order.totalCents}`);
  return { lines, totalCents: order.totalCents, includedTaxCents: !taxAdded && order.taxCents > 0 ? order.taxCents : null };
}
