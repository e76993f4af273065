import { useQuery } from '@tanstack/react-query';
import { useMoney } from '@fryline/ui';
import { orderQueries } from '../api/order-queries';
import { formatDate } from '@fryline/ui/format';
import { CancelOrder } from './cancel-order';
import { ResumePayment } from './resume-payment';

interface ExistingHoldProps {
  orderId: string;
  /** Called once the earlier hold is cancelled, so the new order can go ahead. */
  onResolved: () => void;
}

/** Shown when a new order is refused because an unpaid one is still on hold. */
export function ExistingHold({ orderId, onResolved }: ExistingHoldProps) {
  const order = useQuery(orderQueries.detail(orderId));
  const money = useMoney(order.data?.currency);
  const summary = order.data
    ? ` (${formatDate(order.data.bakeDay.date, order.data.bakeDay.timeZone)}, ${money(order.data.totalCents)})`
    : '';
  return (
    <div role="alert" className="notice notice-warn flex flex-col gap-3">
      <p className="font-extrabold">You already have an unpaid order on hold{summary}.</p>
      <p>Finish paying for it, or cancel it to place this order instead.</p>
      <div className="flex flex-wrap gap-2">
        <ResumePayment orderId={orderId} label="Pay for that order" />
        {order.data && <CancelOrder order={order.data} onCancelled={onResolved} />}
      </div>
    </div>
  );
}
