/**
 * What the plan made of each menu item, for selling the surplus: the pieces
 * ordered of it, plus its share of the extra pieces (the plan's spare and
 * whatever the cutting gave beyond that). Pure.
 *
 * The extra pieces of a kind go to the menu item that takes the spare glaze
 * when there is one; otherwise they are shared in proportion to what was
 * ordered of each item of that kind (largest remainder, earlier menu items
 * first on a tie), and with nothing ordered, to the first item of that kind.
 */
import { requireWholeNonNegative } from './errors.js';

export interface SurplusMenuItem {
  id: string;
  kind: 'ring' | 'hole';
  /** Glaze recipe id, or null. */
  glazeRecipeId: string | null;
}

export interface MadeInput {
  /** The day's menu in display order. */
  menu: readonly SurplusMenuItem[];
  ordered: ReadonlyArray<{ menuItemId: string; quantity: number }>;
  extra: { rings: number; holes: number };
  spareGlazeId: string | null;
}

/** Splits `total` in proportion to `weights` (whole pieces, largest remainder; ties to the lower index). */
export function shareOut(total: number, weights: readonly number[]): number[] {
  requireWholeNonNegative('total', total);
  const sum = weights.reduce((s, w) => s + w, 0);
  if (sum <= 0) return weights.map(() => 0);
  const exact = weights.map((w) => (total * w) / sum);
  const shares = exact.map(Math.floor);
  let left = total - shares.reduce((s, n) => s + n, 0);
  const byRemainder = exact.map((x, i) => ({ i, r: x - Math.floor(x) })).sort((a, b) => b.r - a.r || a.i - b.i);
  for (const { i } of byRemainder) {
    if (left <= 0) break;
    shares[i]! += 1;
    left -= 1;
  }
  return shares;
}

export function madeByMenuItem(input: MadeInput): Map<string, number> {
  const made = new Map<string, number>(input.menu.map((m) => [m.id, 0]));
  for (const o of input.ordered) made.set(o.menuItemId, (made.get(o.menuItemId) ?? 0) + requireWholeNonNegative('ordered.quantity', o.quantity));
  for (const kind of ['ring', 'hole'] as const) {
    const extra = requireWholeNonNegative(`extra.${kind}s`, kind === 'ring' ? input.extra.rings : input.extra.holes);
    const items = input.menu.filter((m) => m.kind === kind);
    if (extra === 0 || items.length === 0) continue;
    const glazed = input.spareGlazeId === null ? undefined : items.find((m) => m.glazeRecipeId === input.spareGlazeId);
    const weights = glazed
      ? items.map((m) => (m === glazed ? 1 : 0))
      : items.map((m) => input.ordered.filter((o) => o.menuItemId === m.id).reduce((s, o) => s + o.quantity, 0));
    const shares = weights.some((w) => w > 0) ? shareOut(extra, weights) : items.map((_, i) => (i === 0 ? extra : 0));
    items.forEach((m, i) => made.set(m.id, made.get(m.id)! + shares[i]!));
  }
  return made;
}
