import type { BakeDayView } from '@fryline/schemas';
import { formatDate, formatMoment } from '@fryline/ui/format';
import { availabilityOf } from './availability';

/** The top of a bake day's page: when, where, and what is left. */
export function BakeDayFacts({ day }: { day: BakeDayView }) {
  const info = availabilityOf(day);
  return (
    <header className="flex flex-col gap-2">
      <p className="text-sm font-extrabold tracking-wide text-sugar-700 uppercase">Bake day</p>
      <h1 tabIndex={-1} className="text-3xl sm:text-4xl">
        {formatDate(day.date, day.timeZone)}
      </h1>
      <p>
        <span className="font-extrabold">{day.place}</span> · <span className="text-muted">{day.address}</span>
      </p>
      <div className="flex flex-wrap items-center gap-2" aria-live="polite">
        <span className={`badge ${info.badgeClass}`}>{info.badge}</span>
        <span className="font-semibold">{info.line}</span>
      </div>
      {info.kind === 'open' && (
        <p className="text-sm text-muted">
          Pre-orders close {formatMoment(day.cutoffAt, day.timeZone)}, when the dough gets mixed.
        </p>
      )}
    </header>
  );
}
