import { Link } from 'react-router-dom';
import type { BakeDayView } from '@fryline/schemas';
import { formatClockRange, formatDate, formatMoment } from '@fryline/ui/format';
import { availabilityOf } from './availability';

const actionLabel = {
  open: 'Choose your box',
  'sold-out': 'Join the waitlist',
  upcoming: 'See the menu',
  closed: 'See the details',
  done: 'See the details',
} as const;

export function BakeDayCard({ day }: { day: BakeDayView }) {
  const info = availabilityOf(day);
  const headingId = `day-${day.id}`;
  return (
    <article className="card flex flex-col gap-3" aria-labelledby={headingId}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 id={headingId} className="text-xl">
          {formatDate(day.date, day.timeZone)}
        </h3>
        <span className={`badge ${info.badgeClass}`}>{info.badge}</span>
      </div>
      <p>
        <span className="font-extrabold">{day.place}</span>
        <br />
        <span className="text-muted">{day.address}</span>
      </p>
      {day.pickupWindows.length > 0 && (
        <div>
          <p className="text-sm font-extrabold text-muted">Pickup</p>
          <ul className="mt-1 flex flex-wrap gap-1.5" aria-label="Pickup windows">
            {day.pickupWindows.map((w) => (
              <li
                key={w.id}
                className={`rounded-full border px-2.5 py-0.5 text-sm font-semibold ${
                  w.ordersLeft === 0 ? 'border-line text-muted line-through' : 'border-plum-300'
                }`}
              >
                {formatClockRange(w.startsAt, w.endsAt, day.timeZone)}
                {w.ordersLeft === 0 && <span className="sr-only"> (full)</span>}
              </li>
            ))}
          </ul>
        </div>
      )}
      <p className={`font-extrabold ${info.kind === 'open' ? 'text-sage-700' : ''}`}>{info.line}</p>
      {info.kind === 'open' && (
        <p className="text-sm text-muted">Orders close {formatMoment(day.cutoffAt, day.timeZone)}.</p>
      )}
      <Link
        to={`/days/${day.id}`}
        className={`btn mt-auto ${info.kind === 'open' ? 'btn-primary' : 'btn-quiet'}`}
        aria-describedby={headingId}
      >
        {actionLabel[info.kind]}
      </Link>
    </article>
  );
}
