import { useQuery } from '@tanstack/react-query';
import { bakeDayQueries } from '../../../lib/queries/bake-day-queries';
import { formatDate } from '@fryline/ui/format';
import { usePublishBakeDay } from '../api/use-publish-bake-day';

/** Drafts the owner saved, each with a button to show it to customers. */
export function DraftBakeDays() {
  const drafts = useQuery(bakeDayQueries.drafts());
  const publish = usePublishBakeDay();
  if (!drafts.data?.length) return null;
  return (
    <section aria-labelledby="draft-days" className="card">
      <h2 id="draft-days" className="text-lg">
        Drafts
      </h2>
      <p className="text-sm text-muted">Customers do not see these until you publish them.</p>
      <ul className="mt-2">
        {drafts.data.map((day) => {
          const when = formatDate(day.date, day.timeZone, 'short');
          return (
            <li key={day.id} className="flex flex-wrap items-center justify-between gap-2 border-t border-line py-2 first:border-t-0">
              <span>
                <span className="font-extrabold">{when}</span> <span className="text-sm text-muted">{day.place}</span>
              </span>
              <button
                type="button"
                className="btn btn-primary btn-small"
                disabled={publish.isPending}
                onClick={() => publish.mutate(day.id)}
              >
                Publish<span className="sr-only"> {when}</span>
              </button>
            </li>
          );
        })}
      </ul>
      {publish.error && (
        <p role="alert" className="field-error">
          {publish.error.message}
        </p>
      )}
    </section>
  );
}
