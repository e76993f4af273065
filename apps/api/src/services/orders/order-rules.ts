import type { BakeDayView, BoxSize, CreateOrderInput, PieceKind } from '@fryline/schemas';
import { boxPieces, priceOrder, wrongKindMessage, type OrderPrice } from '@fryline/schemas';
import { AppError } from '../../lib/app-error.js';

export interface CheckedBox {
  size: BoxSize;
  pieces: number;
  priceCents: number;
  lines: Array<{ menuItemId: string; name: string; kind: PieceKind; quantity: number; surchargeCents: number; allergens: string[] }>;
}

export interface CheckedOrder {
  boxes: CheckedBox[];
  rings: number;
  holes: number;
  price: OrderPrice;
}

/**
 * Checks a requested order against the bake day's own menu and boxes, and
 * prices it from the menu (never from the client). Every problem is named by
 * its field, e.g. "boxes.1.items.0.menuItemId".
 */
export function checkOrder(day: BakeDayView, input: CreateOrderInput): CheckedOrder {
  const fields: Record<string, string> = {};
  const menu = new Map(day.menu.map((m) => [m.id, m]));
  const boxTypes = new Map(day.boxes.map((b) => [b.size, b]));
  if (!day.pickupWindows.some((w) => w.id === input.pickupWindowId)) fields.pickupWindowId = 'This pickup window is not on this bake day';

  const boxes: CheckedBox[] = [];
  input.boxes.forEach((box, b) => {
    const type = boxTypes.get(box.size);
    if (!type) {
      fields[`boxes.${b}.size`] = `This bake day has no ${box.size} boxes`;
      return;
    }
    const lines: CheckedBox['lines'] = [];
    const seen = new Set<string>();
    let count = 0;
    box.items.forEach((item, i) => {
      const menuItem = menu.get(item.menuItemId);
      if (!menuItem) {
        fields[`boxes.${b}.items.${i}.menuItemId`] = 'This item is not on this bake day’s menu';
        return;
      }
      const wrongKind = wrongKindMessage(box.size, menuItem.name, menuItem.kind);
      if (wrongKind) {
        fields[`boxes.${b}.items.${i}.menuItemId`] = wrongKind;
        return;
      }
      if (seen.has(menuItem.id)) {
        fields[`boxes.${b}.items.${i}.menuItemId`] = `${menuItem.name} is listed twice in this box`;
        return;
      }
      seen.add(menuItem.id);
      count += item.quantity;
      lines.push({ menuItemId: menuItem.id, name: menuItem.name, kind: menuItem.kind, quantity: item.quantity, surchargeCents: menuItem.surchargeCents, allergens: menuItem.allergens });
    });
    if (count !== type.pieces && !Object.keys(fields).some((k) => k.startsWith(`boxes.${b}.`))) {
      fields[`boxes.${b}.items`] = `A ${type.label.toLowerCase().replace(/^an? /, '')} holds exactly ${type.pieces}; this one has ${count}`;
    }
    boxes.push({ size: box.size, pieces: type.pieces, priceCents: type.priceCents, lines });
  });
  if (Object.keys(fields).length) {
    const [first] = Object.entries(fields);
    throw new AppError('invalid', `${first![0]}: ${first![1]}`, 400, { fields });
  }
  const rings = boxes.reduce((n, b) => n + boxPieces(b.size, b.pieces).rings, 0);
  const holes = boxes.reduce((n, b) => n + boxPieces(b.size, b.pieces).holes, 0);
  const price = priceOrder(boxes.map((b) => ({ boxPriceCents: b.priceCents, items: b.lines })), day.tax);
  return { boxes, rings, holes, price };
}
