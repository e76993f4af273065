import { useEffect, useState, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import type { OrderDetail } from '@fryline/schemas';
import { orderQueries } from '../api/order-queries';
import { site } from '../../../config/site';
import { isApiError } from '@fryline/ui/api-client';
import { formatClock, formatCutoff, formatDate } from '@fryline/ui/format';
import { signInUrl, currentPath } from '../../../lib/sign-in';
import { ErrorState, LoadingState, Notice, useMoney } from '@fryline/ui';
import { PageTitle } from '../../../components/page-title';
import { OrderStatusBadge } from './order-status';
import { OrderBoxes } from './order-boxes';
import { PickupPass } from './pickup-pass';
import { CancelOrder } from './cancel-order';
import { ResumePayment } from './resume-payment';

interface OrderDetailProps {
  id: string;
  /** Where the "change pickup window" panel goes for a paid order. */
  renderMove?: (order: OrderDetail) => ReactNode;
}

/**
 * One order. After the checkout page sends the customer back (`?paid=1`),
 * the page asks the server every second until the payment is confirmed:
 * the redirect alone proves nothing.
 */
export function OrderDetail({ id, renderMove }: OrderDetailProps) {
  const [params, setParams] = useSearchParams();
  const returnedFromPayment = params.get('paid') === '1';
  const paymentCancelled = params.get('payment') === 'cancelled';
  const [timedOut, setTimedOut] = useState(false);
  const [waitRound, setWaitRound] = useState(0);

  const order = useQuery({
    ...orderQueries.detail(id),
    refetchInterval: (query) =>
      returnedFromPayment && !timedOut && query.state.data?.status === 'held' ? site.paymentPollMs : false,
  });
  const status = order.data?.status;
  const money = useMoney(order.data?.currency);

  useEffect(() => {
    if (!returnedFromPayment || timedOut) return;
    const timer = window.setTimeout(() => setTimedOut(true), site.paymentConfirmTimeoutMs);
    return () => window.clearTimeout(timer);
  }, [returnedFromPayment, timedOut, waitRound]);

  // Once the server has decided, the address no longer needs the payment marker.
  useEffect(() => {
    if (returnedFromPayment && status && status !== 'held') setParams({}, { replace: true });
  }, [returnedFromPayment, status, setParams]);

  if (order.isPending) return <LoadingState label="Loading your order…" />;
  if (order.isError) {
    const error = order.error;
    if (isApiError(error) && error.status === 401) {
      return (
        <Notice>
          <p className="font-extrabold">Please sign in to see this order.</p>
          <a className="btn btn-primary mt-3" href={signInUrl(currentPath())}>
            Sign in
          </a>
        </Notice>
      );
    }
    const title = isApiError(error) && error.status === 404 ? 'We could not find this order' : 'We could not load this order';
    return <ErrorState error={error} title={title} onRetry={() => void order.refetch()} />;
  }

  const data = order.data;
  const tz = data.bakeDay.timeZone;

  return (
    <article className="flex flex-col gap-5" aria-labelledby="order-heading">
      <PageTitle>Your order</PageTitle>
      <header className="flex flex-col gap-2">
        <p className="text-sm font-extrabold tracking-wide text-sugar-700 uppercase">Your order</p>
        <h1 id="order-heading" tabIndex={-1} className="text-3xl">
          {formatDate(data.bakeDay.date, tz)} · {data.bakeDay.place}
        </h1>
        <div aria-live="polite">
          <OrderStatusBadge status={data.status} />
        </div>
      </header>

      <div aria-live="polite">
        {data.status === 'held' && returnedFromPayment && !timedOut && (
          <div className="card flex items-center gap-4">
            <span className="spinner size-8 shrink-0" aria-hidden="true" />
            <div>
              <p className="text-lg font-extrabold">Confirming your payment…</p>
              <p className="text-muted">This usually takes a few seconds. You can keep this page open.</p>
            </div>
          </div>
        )}
        {data.status === 'held' && returnedFromPayment && timedOut && (
          <Notice tone="warn">
            <p className="font-extrabold">We have not had the confirmation yet</p>
            <p>
              The payment service has not told us about your payment so far. If you paid, it will show up here and
              you will get an e-mail with your pickup code; there is no need to pay again.
            </p>
            <button
              type="button"
              className="btn btn-quiet btn-small mt-3"
              onClick={() => {
                setTimedOut(false);
                setWaitRound((n) => n + 1);
                void order.refetch();
              }}
            >
              Check again
            </button>
          </Notice>
        )}
        {data.status === 'held' && !returnedFromPayment && (
          <Notice tone="warn">
            <p className="font-extrabold">
              {paymentCancelled ? 'Payment was not completed' : 'This order is waiting for payment'}
            </p>
            <p>
              {data.holdExpiresAt
                ? `Your boxes are held until ${formatClock(data.holdExpiresAt, tz)}.`
                : 'Your boxes are held for a short while.'}{' '}
              Pay to confirm them; if the hold lapses, nothing is charged.
            </p>
            <div className="mt-3 flex flex-wrap gap-2">
              <ResumePayment orderId={data.id} />
              {data.canCancel && <CancelOrder order={data} />}
            </div>
          </Notice>
        )}
        {data.status === 'collected' && (
          <Notice tone="ok">
            <p className="font-extrabold">Collected. Enjoy your doughnuts!</p>
          </Notice>
        )}
        {data.status === 'no_show' && (
          <Notice>
            <p className="font-extrabold">This order was not collected on the day.</p>
          </Notice>
        )}
        {data.status === 'cancelled' && (
          <Notice>
            <p className="font-extrabold">This order was cancelled.</p>
            {data.refundedCents > 0 && <p>{money(data.refundedCents)} goes back to the card you paid with.</p>}
          </Notice>
        )}
        {data.status === 'refunded' && (
          <Notice>
            <p className="font-extrabold">This order was refunded.</p>
            <p>
              {money(data.refundedCents)} goes back to the card you paid with. Banks can take a few days to show
              it.
            </p>
          </Notice>
        )}
        {data.status === 'expired' && (
          <Notice>
            <p className="font-extrabold">The hold lapsed before payment came through.</p>
            <p>Nothing was charged, and the doughnuts went back on sale.</p>
            <Link className="btn btn-primary mt-3" to={`/days/${data.bakeDay.id}`}>
              Order again
            </Link>
          </Notice>
        )}
      </div>

      {data.status === 'paid' && params.get('changed') === '1' && (
        <Notice>
          <p className="font-extrabold">We changed your pickup.</p>
          <p>The e-mail we sent says what changed. If it no longer suits you, move to another window or cancel for a full refund below.</p>
        </Notice>
      )}

      {data.status === 'paid' && <PickupPass order={data} />}

      <OrderBoxes order={data} />

      {data.status === 'paid' && (
        <div className="flex flex-col gap-4">
          {/* canCancel: before the cut-off, or later when the shop changed this order's pickup */}
          {data.canCancel && renderMove?.(data)}
          {data.canCancel && (
            <div className="card flex flex-col items-start gap-2">
              <h2 className="text-lg">Plans changed?</h2>
              <p className="text-muted">You can cancel for a full refund until pre-orders close, {formatCutoff(data.bakeDay.cutoffAt, tz)}.</p>
              <CancelOrder order={data} />
            </div>
          )}
        </div>
      )}

      <Link to="/orders" className="font-semibold text-plum-700 underline">
        All my orders
      </Link>
    </article>
  );
}
