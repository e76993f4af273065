import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { formatCents, type PaymentFlagView } from '@fryline/schemas';
import { ErrorState, LoadingState, useShop } from '@fryline/ui';
import { formatDate, formatDateTime } from '@fryline/ui/format';
import { PageFrame } from '../../../components/page-frame';
import { paymentChecksQueries } from '../api/payment-checks-queries';
import { orderStatusNames } from '../../../lib/order-status-names';

/** Where the money of a flagged payment stands, in words (never colour alone). */
const refundWords: Record<PaymentFlagView['refundStatus'], { text: string; icon: string; tone: string }> = {
  succeeded: { text: 'Refunded in full', icon: '↩', tone: 'notice-ok' },
  pending: { text: 'Refund not made yet: it is tried again every few minutes', icon: '…', tone: 'notice-warn' },
  failed: { text: 'Refund failed: refund it at the payments company and note it here', icon: '!', tone: 'notice-bad' },
  none: { text: 'Nothing was charged, so nothing to refund', icon: '–', tone: '' },
};

/**
 * `/staff/payment-checks`: payments whose checkout did not match their order
 * (another session, another amount or currency). Such a payment never marks
 * the order paid; it is refunded in full at once, and listed here so the
 * owner can see it and, if they like, tell the customer.
 */
export function PaymentChecksPage() {
  const flags = useQuery(paymentChecksQueries.flags());
  const timeZone = useShop()?.timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;

  return (
    <PageFrame
      eyebrow="Owner"
      title="Payment checks"
      intro="Every payment is checked against its order: the same checkout, the same amount, the same currency. One that doesn't match never confirms the order and is refunded in full at once. They are listed here."
    >
      {flags.isPending ? (
        <LoadingState label="Loading the payment checks…" />
      ) : flags.isError ? (
        <ErrorState error={flags.error} title="The payment checks could not be loaded" onRetry={() => void flags.refetch()} />
      ) : flags.data.length === 0 ? (
        <section className="card">
          <h2 className="text-xl">No payment has failed its check</h2>
          <p className="text-muted">Nothing to do here.</p>
        </section>
      ) : (
        <section className="flex flex-col gap-3" aria-labelledby="flags-heading">
        <h2 id="flags-heading" className="text-xl">
          {flags.data.length === 1 ? '1 payment that didn’t match' : `${flags.data.length} payments that didn’t match`}
        </h2>
        <ul className="flex flex-col gap-3">
          {flags.data.map((flag) => {
            const refund = refundWords[flag.refundStatus];
            return (
              <li key={flag.id} className="card flex flex-col gap-2">
                <p className="text-lg font-extrabold">
                  {formatCents(flag.amountCents, flag.currency || 'usd')} paid{' '}
                  {flag.order ? <>by {flag.order.customerName}</> : <>for no order we know</>}
                </p>
                <p>
                  <span className="font-semibold">What was wrong: </span>
                  {flag.problem}.
                </p>
                {flag.order && (
                  <p className="text-muted">
                    Order for {formatDate(flag.order.bakeDayDate, timeZone)} ({formatCents(flag.order.totalCents, flag.currency || 'usd')}), now{' '}
                    {(orderStatusNames[flag.order.status as keyof typeof orderStatusNames] ?? flag.order.status).toLowerCase()} · {flag.order.customerEmail} ·{' '}
                    <Link className="font-extrabold text-plum-800 underline" to={`/bake-days/${flag.order.bakeDayId}`}>
                      the day's orders
                    </Link>
                  </p>
                )}
                <p className={`notice ${refund.tone}`}>
                  <span aria-hidden="true">{refund.icon} </span>
                  {refund.text}
                </p>
                <p className="text-sm text-muted">
                  Checked <time dateTime={flag.createdAt}>{formatDateTime(flag.createdAt, timeZone)}</time> · checkout {flag.checkoutSessionId}
                </p>
              </li>
            );
          })}
        </ul>
        </section>
      )}
    </PageFrame>
  );
}
