import type { ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { BakeDayView } from '@fryline/schemas';
import { bakeDayQueries, nextBakeDay } from '../../../lib/queries/bake-day-queries';
import { formatClockRange, formatDate, formatMoment, formatPieces } from '@fryline/ui/format';
import { ErrorState, LoadingState } from '@fryline/ui';
import { BakeDayStatusBadge } from './status-badge';

interface NextBakeDayProps {
  /** Role-specific lines and links under the bake day's facts. */
  children?: (day: BakeDayView) => ReactNode;
}

/** The coming bake day at a glance: when, where, pickup windows, and how much is spoken for. */
export function NextBakeDay({ children }: NextBakeDayProps) {
  const days = useQuery(bakeDayQueries.upcoming());

  if (days.isPending) return <LoadingState label="Finding the next bake day…" />;
  if (days.isError) {
    return <ErrorState error={days.error} title="Bake days could not be loaded" onRetry={() => void days.refetch()} />;
  }
  const day = nextBakeDay(days.data);
  if (!day) {
    return (
      <div className="card">
        <p className="font-extrabold">No bake day is coming up.</p>
        <p className="text-muted">When the owner sets one up, it shows here.</p>
      </div>
    );
  }

  const rings = day.capacity.rings - day.remaining.rings;
  const holes = day.capacity.holes - day.remaining.holes;
  return (
    <section className="card flex flex-col gap-3" aria-labelledby="next-day-heading">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="next-day-heading" className="text-xl">
          Next: {formatDate(day.date, day.timeZone)}
        </h2>
        <BakeDayStatusBadge status={day.status} />
      </div>
      <p>
        <span className="font-extrabold">{day.place}</span> · <span className="text-muted">{day.address}</span>
      </p>
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
        <div>
          <dt className="text-sm font-extrabold text-muted">Spoken for so far</dt>
          <dd>{formatPieces(rings, holes)}</dd>
        </div>
        <div>
          <dt className="text-sm font-extrabold text-muted">Pre-orders close</dt>
          <dd>{formatMoment(day.cutoffAt, day.timeZone)}</dd>
        </div>
        <div className="sm:col-span-2">
          <dt className="text-sm font-extrabold text-muted">Pickup windows</dt>
          <dd className="flex flex-wrap gap-1.5 pt-1">
            {day.pickupWindows.map((w) => (
              <span key={w.id} className="badge">
                {formatClockRange(w.startsAt, w.endsAt, day.timeZone)}
              </span>
            ))}
          </dd>
        </div>
      </dl>
      {children?.(day)}
    </section>
  );
}
