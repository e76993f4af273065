import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { bakeDayQueries } from '../../../lib/queries/bake-day-queries';
import { formatDate } from '@fryline/ui/format';

/** Recent bake days that are over, each linking to its orders (for no-shows and late refunds). */
export function PastBakeDays() {
  const past = useQuery(bakeDayQueries.past());
  if (!past.data?.length) return null;
  return (
    <section aria-labelledby="past-days" className="card">
      <h2 id="past-days" className="text-lg">
        Past bake days
      </h2>
      <ul className="mt-2">
        {past.data.map((day) => (
          <li key={day.id} className="border-t border-line py-2 first:border-t-0">
            <Link to={`/bake-days/${day.id}`} className="font-extrabold text-plum-800 underline decoration-plum-300 decoration-2 hover:decoration-plum-800">
              <span className="sr-only">Orders for </span>
              {formatDate(day.date, day.timeZone, 'short')}
            </Link>
            <span className="ml-2 text-sm text-muted">{day.place}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
