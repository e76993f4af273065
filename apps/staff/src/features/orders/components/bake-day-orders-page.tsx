import { useDeferredValue, useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { type RefundView, type StaffOrderView } from '@fryline/schemas';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState, useMoney } from '@fryline/ui';
import { isApiError } from '@fryline/ui/api-client';
import { formatClockRange, formatDate, plural } from '@fryline/ui/format';
import { bakeDayOrdersQueries } from '../api/bake-day-orders-queries';
import { groupByWindow, matchesOrder } from '../model/order-list';
import { OrderCard } from './order-card';
import { OrdersSummary } from './orders-summary';
import { RefundDialog } from './refund-dialog';

interface BakeDayOrdersPageProps {
  bakeDayId: string;
  /** The owner may refund; others see the list only. */
  canRefund: boolean;
}

function BackLink() {
  return (
    <p>
      <Link to="/bake-days" className="font-extrabold text-plum-800">
        <span aria-hidden="true">← </span>All bake days
      </Link>
    </p>
  );
}

/** Every order of one bake day (`/staff/bake-days/:id`), by pickup window, with search and refunds. */
export function BakeDayOrdersPage({ bakeDayId, canRefund }: BakeDayOrdersPageProps) {
  const money = useMoney();
  const day = useQuery(bakeDayOrdersQueries.day(bakeDayId));
  const orders = useQuery(bakeDayOrdersQueries.orders(bakeDayId));
  const [search, setSearch] = useState('');
  const query = useDeferredValue(search);
  const [refunding, setRefunding] = useState<StaffOrderView | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const noticeRef = useRef<HTMLParagraphElement>(null);

  // After a refund the button that opened the dialog may be gone: start again from the message.
  useEffect(() => {
    if (notice) noticeRef.current?.focus();
  }, [notice]);

  if (day.isPending) {
    return (
      <PageFrame title="Orders">
        <LoadingState label="Loading the bake day…" />
      </PageFrame>
    );
  }
  if (day.isError) {
    const missing = isApiError(day.error) && (day.error.status === 404 || day.error.status === 400);
    return (
      <PageFrame title={missing ? 'No such bake day' : 'Orders'} intro={missing ? 'The link may be old.' : undefined}>
        <BackLink />
        {!missing && (
          <ErrorState error={day.error} title="This bake day could not be loaded" onRetry={() => void day.refetch()} />
        )}
      </PageFrame>
    );
  }

  const { timeZone } = day.data;
  const onRefunded = (order: StaffOrderView, made: RefundView) => {
    setRefunding(null);
    const rest = made.order.totalCents - made.order.refundedCents;
    const after =
      made.order.status === 'refunded' && order.status !== 'refunded'
        ? ' The order is now refunded and its doughnuts are back on sale.'
        : rest > 0
          ? ` ${money(rest)} is left to refund on this order.`
          : ' Nothing is left to refund on this order.';
    setNotice(`Refunded ${money(made.amountCents)} to ${order.customer.name}.${after}`);
  };

  const shown = orders.data?.filter((order) => matchesOrder(order, query)) ?? [];
  const searching = query.trim() !== '';
  const groups = groupByWindow(day.data.pickupWindows, shown).filter((group) => !searching || group.orders.length > 0);

  return (
    <PageFrame
      eyebrow="Bake day"
      title={`Orders for ${formatDate(day.data.date, timeZone)}, ${day.data.place}`}
      intro={`Every pre-order for this bake day, by pickup window. Times are in ${timeZone.replace(/_/g, ' ')} time.`}
    >
      <BackLink />
      {canRefund && (
        <p>
          <Link to={`/bake-days/${bakeDayId}/edit`} className="btn btn-quiet btn-small">
            Change or call off this bake day
          </Link>
        </p>
      )}
      {notice && (
        <p ref={noticeRef} tabIndex={-1} role="status" className="notice notice-ok flex items-start justify-between gap-3">
          <span>{notice}</span>
          <button type="button" className="btn btn-quiet btn-small bg-white" onClick={() => setNotice(null)}>
            Dismiss
          </button>
        </p>
      )}
      <OrdersSummary day={day.data} orders={orders.data} />

      <section aria-labelledby="orders-heading" className="flex flex-col gap-4">
        <h2 id="orders-heading" className="text-xl">
          Orders
        </h2>
        <div role="search" aria-label="Orders" className="max-w-md">
          <label htmlFor="order-search" className="field-label">
            Find an order
          </label>
          <input
            id="order-search"
            type="search"
            className="field-input"
            autoComplete="off"
            spellCheck={false}
            aria-describedby="order-search-help"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
          />
          <p id="order-search-help" className="mt-1 text-sm text-muted">
            Name, e-mail or pickup code
          </p>
        </div>

        {orders.isPending ? (
          <LoadingState label="Loading orders…" />
        ) : orders.isError ? (
          <ErrorState error={orders.error} title="Orders could not be loaded" onRetry={() => void orders.refetch()} />
        ) : (
          <>
            <p role="status" className="text-sm font-semibold text-muted">
              {searching
                ? `Showing ${shown.length} of ${plural(orders.data.length, 'order')} for “${query.trim()}”.`
                : `${plural(orders.data.length, 'order')} in all.`}
            </p>
            {groups.map(({ window, orders: inWindow }) => (
              <section key={window.id} aria-labelledby={`window-${window.id}`} className="flex flex-col gap-2">
                <h3 id={`window-${window.id}`} className="text-lg">
                  Pickup {formatClockRange(window.startsAt, window.endsAt, timeZone)}
                  <span className="font-semibold text-muted"> · {plural(inWindow.length, 'order')}</span>
                </h3>
                {inWindow.length === 0 ? (
                  <p className="text-muted">No orders for this pickup window.</p>
                ) : (
                  <ul className="grid gap-3 md:grid-cols-2 xl:grid-cols-3">
                    {inWindow.map((order) => (
                      <li key={order.id}>
                        <OrderCard order={order} onRefund={canRefund ? setRefunding : undefined} />
                      </li>
                    ))}
                  </ul>
                )}
              </section>
            ))}
          </>
        )}
      </section>

      {refunding && (
        <RefundDialog
          order={refunding}
          onClose={() => setRefunding(null)}
          onRefunded={(made) => onRefunded(refunding, made)}
        />
      )}
    </PageFrame>
  );
}
