import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { bakeDayQueries } from '../../../lib/queries/bake-day-queries';
import { formatDate, formatMoment } from '@fryline/ui/format';
import { ErrorState, LoadingState } from '@fryline/ui';
import { BakeDayStatusBadge } from './status-badge';
import { CapacityMeter } from './capacity-meter';

/** Upcoming bake days with what is left of their capacity; each date opens that day's orders. */
export function CapacityTable({ caption = 'Upcoming bake days' }: { caption?: string }) {
  const days = useQuery(bakeDayQueries.upcoming());

  if (days.isPending) return <LoadingState label="Loading bake days…" />;
  if (days.isError) {
    return <ErrorState error={days.error} title="Bake days could not be loaded" onRetry={() => void days.refetch()} />;
  }
  if (days.data.length === 0) {
    return (
      <div className="card">
        <p className="font-extrabold">No bake days are planned.</p>
        <p className="text-muted">Bake days you set up appear here with their capacity.</p>
      </div>
    );
  }

  return (
    <div className="card overflow-x-auto p-0 sm:p-0">
      <table className="w-full text-left">
        <caption className="px-4 pt-4 text-left text-lg font-extrabold sm:px-6">{caption}</caption>
        <thead className="text-sm text-muted">
          <tr className="border-b border-line">
            <th scope="col" className="py-2 pr-2 pl-4 sm:px-6">
              Bake day
            </th>
            <th scope="col" className="px-3 py-2">
              Rings left
            </th>
            <th scope="col" className="px-3 py-2">
              Holes left
            </th>
            <th scope="col" className="hidden px-4 py-2 md:table-cell">
              Orders close
            </th>
          </tr>
        </thead>
        <tbody>
          {days.data.map((day) => (
            <tr key={day.id} className="border-b border-line align-top last:border-b-0">
              <th scope="row" className="py-3 pr-2 pl-4 font-normal sm:px-6">
                <Link
                  to={`/bake-days/${day.id}`}
                  className="block font-extrabold text-plum-800 underline decoration-plum-300 decoration-2 hover:decoration-plum-800"
                >
                  <span className="sr-only">Orders for </span>
                  {formatDate(day.date, day.timeZone, 'short')}
                </Link>
                <span className="block text-sm text-muted">{day.place}</span>
                <span className="mt-1 inline-block">
                  <BakeDayStatusBadge status={day.status} />
                </span>
              </th>
              <td className="px-3 py-3">
                <CapacityMeter left={day.remaining.rings} capacity={day.capacity.rings} unit="rings" />
              </td>
              <td className="px-3 py-3 pr-4">
                {day.capacity.holes > 0 ? (
                  <CapacityMeter left={day.remaining.holes} capacity={day.capacity.holes} unit="holes" />
                ) : (
                  <span className="text-muted">none</span>
                )}
              </td>
              <td className="hidden px-4 py-3 md:table-cell">{formatMoment(day.cutoffAt, day.timeZone)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
