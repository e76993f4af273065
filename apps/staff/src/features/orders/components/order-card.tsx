import { boxLabel, type StaffOrderView } from '@fryline/schemas';
import { useMoney } from '@fryline/ui';
import { formatPieces } from '@fryline/ui/format';
import { refundableCents } from '../model/refund-form';
import { Fact } from './fact';
import { OrderStatusBadge } from './order-status-badge';

interface OrderCardProps {
  order: StaffOrderView;
  /** Shown to the owner only; absent, no refund button. */
  onRefund?: (order: StaffOrderView) => void;
}

/** One order: who, pickup code, status, what is in the boxes, and the money. */
export function OrderCard({ order, onRefund }: OrderCardProps) {
  const money = useMoney(order.currency);
  const headingId = `order-${order.id}`;
  const left = refundableCents(order);
  return (
    <article aria-labelledby={headingId} className="card flex h-full flex-col gap-3 p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h4 id={headingId} className="text-lg leading-tight font-extrabold">
            {order.customer.name}
          </h4>
          <p className="text-sm break-all text-muted">{order.customer.email}</p>
        </div>
        <OrderStatusBadge status={order.status} />
      </div>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2">
        <Fact label="Pickup code" valueClassName="font-mono font-bold tracking-wider">
          {order.pickupCode ?? '—'}
        </Fact>
        <Fact label="Doughnuts">{formatPieces(order.rings, order.holes)}</Fact>
        <Fact label="Total" valueClassName="tabular-nums">
          {money(order.totalCents)}
        </Fact>
        <Fact label="Refunded" valueClassName="tabular-nums">
          {order.refundedCents > 0 ? money(order.refundedCents) : <span className="text-muted">none</span>}
        </Fact>
      </dl>
      {order.boxes.length > 0 && (
        <ul aria-label="Boxes" className="flex flex-col gap-1 border-t border-line pt-2 text-sm">
          {order.boxes.map((box, index) => (
            <li key={index}>
              <span className="font-extrabold">{boxLabel(box.size)}:</span>{' '}
              {box.items.map((item) => `${item.quantity} × ${item.name}`).join(', ')}
            </li>
          ))}
        </ul>
      )}
      <details className="border-t border-line pt-2 text-sm">
        <summary className="cursor-pointer font-semibold">What the {money(order.totalCents)} is made of</summary>
        <dl className="mt-1 grid grid-cols-[1fr_auto] gap-x-3" data-testid="price-lines">
          {order.priceLines.map((line, index) => (
            <div key={index} className="contents" data-price-line={line.kind} data-cents={line.cents}>
              <dt className={line.kind === 'box' ? 'font-semibold' : 'pl-3 text-muted'}>{line.label}</dt>
              <dd className="text-right tabular-nums">{money(line.cents)}</dd>
            </div>
          ))}
          <div className="contents" data-price-total={order.totalCents}>
            <dt className="border-t border-line font-extrabold">Total</dt>
            <dd className="border-t border-line text-right font-extrabold tabular-nums">{money(order.totalCents)}</dd>
          </div>
        </dl>
      </details>
      {onRefund && left > 0 && (
        <button type="button" className="btn btn-quiet btn-small mt-auto self-start" onClick={() => onRefund(order)}>
          Refund<span className="sr-only"> {order.customer.name}’s order</span>
        </button>
      )}
    </article>
  );
}
