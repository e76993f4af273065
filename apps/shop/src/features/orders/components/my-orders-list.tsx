import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { orderQueries } from '../api/order-queries';
import { isApiError } from '@fryline/ui/api-client';
import { boxLabel, formatCents } from '@fryline/schemas';
import { formatClockRange, formatDate } from '@fryline/ui/format';
import { signInUrl } from '../../../lib/sign-in';
import { ErrorState, LoadingState, Notice } from '@fryline/ui';
import { OrderStatusBadge } from './order-status';

/** The signed-in customer's orders, newest first. */
export function MyOrdersList() {
  const orders = useQuery(orderQueries.list());

  if (orders.isPending) return <LoadingState label="Loading your orders…" />;
  if (orders.isError) {
    if (isApiError(orders.error) && orders.error.status === 401) {
      return (
        <Notice>
          <p className="font-extrabold">Sign in to see your orders.</p>
          <a className="btn btn-primary mt-3" href={signInUrl('/orders')}>
            Sign in
          </a>
        </Notice>
      );
    }
    return <ErrorState error={orders.error} title="We could not load your orders" onRetry={() => void orders.refetch()} />;
  }
  if (orders.data.length === 0) {
    return (
      <div className="card">
        <p className="font-extrabold">No orders yet.</p>
        <Link className="btn btn-primary mt-3" to="/">
          See the bake days
        </Link>
      </div>
    );
  }

  return (
    <ul className="flex flex-col gap-3">
      {orders.data.map((order) => {
        const tz = order.bakeDay.timeZone;
        const boxes = order.boxes.map((box) => boxLabel(box.size).toLowerCase()).join(', ');
        return (
          <li key={order.id}>
            <Link
              to={`/orders/${order.id}`}
              className="card flex flex-col gap-1 no-underline transition-colors hover:border-plum-300"
            >
              <span className="flex flex-wrap items-center justify-between gap-2">
                <span className="text-lg font-extrabold">{formatDate(order.bakeDay.date, tz)}</span>
                <OrderStatusBadge status={order.status} />
              </span>
              <span>
                {order.bakeDay.place} · {formatClockRange(order.pickupWindow.startsAt, order.pickupWindow.endsAt, tz)}
              </span>
              <span className="text-sm text-muted">
                {boxes} · {formatCents(order.totalCents, order.currency)}
                {order.pickupCode && order.status === 'paid' && <> · code {order.pickupCode}</>}
              </span>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
