import { boxLabel, orderBill, type OrderView } from '@fryline/schemas';
import { PriceLines } from '../../../components/price-lines';
import { listWords } from '@fryline/ui/format';
import { allergensOf, AllergenList } from '../../../components/allergen-list';

/** What is in the order, what it cost, and its allergens. */
export function OrderBoxes({ order }: { order: OrderView }) {
  const allergens = allergensOf(order.boxes.flatMap((box) => box.items));
  const bill = orderBill(order, order.currency);
  return (
    <section className="card" aria-labelledby="boxes-heading">
      <h2 id="boxes-heading" className="text-lg">
        Your boxes
      </h2>
      <ul className="mt-2 divide-y divide-line">
        {order.boxes.map((box, index) => (
          <li key={index} className="py-3">
            <p className="font-extrabold">
              {boxLabel(box.size)} <span className="font-semibold text-muted">({box.pieces})</span>
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
      <h3 className="mt-2 border-t border-line pt-3 text-base">What you pay</h3>
      <PriceLines bill={bill} refundedCents={order.refundedCents} currency={order.currency} />
      {allergens.length > 0 && (
        <div className="mt-3 border-t border-line pt-3">
          <AllergenList allergens={allergens} label="This order contains" />
          <p className="sr-only">This order contains {listWords(allergens)}.</p>
        </div>
      )}
    </section>
  );
}
