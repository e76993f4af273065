import { formatClockRange, formatDate } from '@fryline/ui/format';
import type { OrderDetail } from '@fryline/schemas';

/** The paid order's pass: the pickup code, its QR image, and where and when to come. */
export function PickupPass({ order }: { order: OrderDetail }) {
  const { bakeDay, pickupWindow } = order;
  return (
    <section className="card border-2 border-plum-700 text-center" aria-labelledby="pass-heading">
      <h2 id="pass-heading" className="text-lg text-muted">
        Your pickup code
      </h2>
      <p className="mt-1 font-mono text-5xl font-extrabold tracking-[0.2em] text-plum-800 sm:text-6xl">
        {order.pickupCode ?? '—'}
      </p>
      {order.qrDataUrl && (
        <img
          src={order.qrDataUrl}
          alt={`QR code for pickup code ${order.pickupCode ?? ''}`}
          className="mx-auto mt-4 size-48 rounded-xl bg-white p-2 [image-rendering:pixelated]"
          width={192}
          height={192}
        />
      )}
      <p className="mt-3 text-sm text-muted">Show the code or the QR image at the stand.</p>
      <div className="mt-4 rounded-2xl bg-crumb p-3">
        <p className="text-lg font-extrabold">
          {formatDate(bakeDay.date, bakeDay.timeZone)},{' '}
          {formatClockRange(pickupWindow.startsAt, pickupWindow.endsAt, bakeDay.timeZone)}
        </p>
        <p>
          {bakeDay.place} · <span className="text-muted">{bakeDay.address}</span>
        </p>
      </div>
      {order.calendarUrl && (
        <a className="btn btn-quiet mt-4" href={order.calendarUrl} download="fryline-pickup.ics">
          Add to calendar
        </a>
      )}
    </section>
  );
}
