import { boxLabel, formatCents, type OrderView } from '@fryline/schemas';
import { listWords } from '@fryline/ui/format';
import { allergensOf, AllergenList } from '../../../components/allergen-list';

/** What is in the order, what it cost, and its allergens. */
export function OrderBoxes({ order }: { order: OrderView }) {
  const allergens = allergensOf(order.boxes.flatMap((box) => box.items));
  return (
    <section className="card" aria-labelledby="boxes-heading">
      <h2 id="boxes-heading" className="text-lg">
        Your boxes
      </h2>
      <ul className="mt-2 divide-y divide-line">
        {order.boxes.map((box, index) => (
          <li key={index} className="py-3">
            <p className="flex justify-between gap-3 font-extrabold">
              <span>
                {boxLabel(box.size)} <span className="font-semibold text-muted">({box.pieces})</span>
              </span>
              <span>{formatCents(box.priceCents)}</span>
            </p>
            <ul className="mt-1 text-sm">
              {box.items.map((item) => (
                <li key={item.menuItemId}>
                  {item.quantity} × {item.name}
                </li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
      <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 border-t border-line pt-3">
        {order.taxCents > 0 && (
          <>
            <dt className="text-muted">Tax</dt>
            <dd className="text-right text-muted">{formatCents(order.taxCents)}</dd>
          </>
        )}
        <dt className="font-extrabold">Total</dt>
        <dd className="text-right font-extrabold">{formatCents(order.totalCents)}</dd>
        {order.refundedCents > 0 && (
          <>
            <dt className="text-sage-700">Refunded</dt>
            <dd className="text-right text-sage-700">{formatCents(order.refundedCents)}</dd>
          </>
        )}
      </dl>
      {allergens.length > 0 && (
        <div className="mt-3 border-t border-line pt-3">
          <AllergenList allergens={allergens} label="This order contains" />
          <p className="sr-only">This order contains {listWords(allergens)}.</p>
        </div>
      )}
    </section>
  );
}
