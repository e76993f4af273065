import { useQuery } from '@tanstack/react-query';
import type { BakeDayView, WaitlistEntryView } from '@fryline/schemas';
import { waitlistQueries } from '../api/waitlist-queries';
import { useLeaveWaitlist } from '../api/use-waitlist-actions';
import { errorMessage } from '@fryline/ui/api-client';
import { formatDate, formatDateTime, formatPieces } from '@fryline/ui/format';
import { useToast } from '../../../components/toast';

function describe(entry: WaitlistEntryView, day: BakeDayView | undefined) {
  const what = formatPieces(entry.rings, entry.holes);
  const when = day ? `${formatDate(day.date, day.timeZone)}, ${day.place}` : 'A coming bake day';
  let state = entry.position ? `Number ${entry.position} in line` : 'Waiting';
  if (entry.status === 'offered') {
    state =
      entry.offerExpiresAt && day
        ? `Offered to you until ${formatDateTime(entry.offerExpiresAt, day.timeZone)}: use the link in your e-mail`
        : 'Offered to you: use the link in your e-mail';
  }
  return { what, when, state };
}

interface MyWaitlistProps {
  /** Upcoming bake days, to say which day each entry is for. */
  bakeDays: BakeDayView[] | undefined;
}

/** My places on waitlists; hidden when there are none or nobody is signed in. */
export function MyWaitlist({ bakeDays }: MyWaitlistProps) {
  const entries = useQuery(waitlistQueries.mine());
  const leave = useLeaveWaitlist();
  const toast = useToast();

  if (!entries.data || entries.data.length === 0) return null;

  return (
    <section aria-labelledby="my-waitlist-heading" className="flex flex-col gap-3">
      <h2 id="my-waitlist-heading" className="text-xl">
        On the waitlist
      </h2>
      <ul className="flex flex-col gap-3">
        {entries.data.map((entry) => {
          const { what, when, state } = describe(entry, bakeDays?.find((day) => day.id === entry.bakeDayId));
          return (
            <li key={entry.id} className="card flex flex-wrap items-center justify-between gap-3">
              <div>
                <p className="font-extrabold">{when}</p>
                <p className="text-sm">{what}</p>
                <p className={`text-sm ${entry.status === 'offered' ? 'font-extrabold text-sage-700' : 'text-muted'}`}>
                  {state}
                </p>
              </div>
              <button
                type="button"
                className="btn btn-quiet btn-small"
                disabled={leave.isPending}
                onClick={() =>
                  leave.mutate(entry.id, {
                    onSuccess: () => toast('You have left that waitlist.'),
                    onError: (error) => toast(errorMessage(error), 'bad'),
                  })
                }
              >
                Leave<span className="sr-only"> the waitlist for {when}</span>
              </button>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
