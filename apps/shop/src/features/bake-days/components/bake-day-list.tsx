import { useQuery } from '@tanstack/react-query';
import { bakeDayQueries } from '../api/bake-day-queries';
import { BakeDayCard } from './bake-day-card';
import { ErrorState, LoadingState } from '@fryline/ui';

export function BakeDayList() {
  const days = useQuery(bakeDayQueries.list());

  if (days.isPending) return <LoadingState label="Looking up the bake days…" />;
  if (days.isError) {
    return <ErrorState error={days.error} title="We could not load the bake days" onRetry={() => void days.refetch()} />;
  }
  if (days.data.length === 0) {
    return (
      <div className="card text-center">
        <p className="font-extrabold">No bake days are planned just now.</p>
        <p className="text-muted">New dates appear here as soon as they are set. Check back soon.</p>
      </div>
    );
  }
  return (
    <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      {days.data.map((day) => (
        <li key={day.id} className="flex">
          <BakeDayCard day={day} />
        </li>
      ))}
    </ul>
  );
}
