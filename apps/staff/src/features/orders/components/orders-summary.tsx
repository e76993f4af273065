import { type BakeDayView, type StaffOrderView } from '@fryline/schemas';
import { useMoney } from '@fryline/ui';
import { summariseOrders } from '../model/order-list';
import { Fact } from './fact';
import { orderStatusNames } from '../../../lib/order-status-names';

const moneyText = 'text-xl font-extrabold tabular-nums';

function Taken({ label, capacity, left }: { label: string; capacity: number; left: number }) {
  const taken = capacity - left;
  return (
    <Fact label={label} valueClassName="tabular-nums">
      {capacity > 0 ? (
        <>
          <span className="text-xl font-extrabold">{taken}</span> taken of {capacity}
          <meter className="mt-1 block h-2 w-full" min={0} max={capacity} value={taken} aria-hidden="true" />
        </>
      ) : (
        <span className="text-muted">none on sale</span>
      )}
    </Fact>
  );
}

/** Orders by status, the money in and out, and how much of the capacity is taken. */
export function OrdersSummary({ day, orders }: { day: BakeDayView; orders: readonly StaffOrderView[] | undefined }) {
  const money = useMoney();
  const summary = orders && summariseOrders(orders);
  return (
    <section aria-labelledby="summary-heading" className="card flex flex-col gap-4">
      <h2 id="summary-heading" className="text-xl">
        Summary
      </h2>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-4">
        <Taken label="Rings" capacity={day.capacity.rings} left={day.remaining.rings} />
        <Taken label="Holes" capacity={day.capacity.holes} left={day.remaining.holes} />
        {summary && (
          <>
            <Fact label="Paid" valueClassName={moneyText}>
              {money(summary.paidCents)}
            </Fact>
            <Fact label="Refunded" valueClassName={moneyText}>
              {money(summary.refundedCents)}
            </Fact>
          </>
        )}
      </dl>
      {summary && (
        <div>
          <h3 className="text-base text-muted">
            Orders by status
          </h3>
          {summary.byStatus.length === 0 ? (
            <p>No orders yet.</p>
          ) : (
            <dl className="mt-1 flex flex-wrap gap-2">
              {summary.byStatus.map(({ status, count }) => (
                <div key={status} className="flex items-baseline gap-1.5 rounded-full bg-crumb px-3 py-1">
                  <dt>{orderStatusNames[status]}</dt>
                  <dd className="font-extrabold tabular-nums">{count}</dd>
                </div>
              ))}
            </dl>
          )}
        </div>
      )}
    </section>
  );
}
