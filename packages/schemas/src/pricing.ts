import type { TaxSetting } from './bake-days.js';
import { roundHalfUp } from '@fryline/production';

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
