import { useEffect, useRef } from 'react';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { formatDate, formatDateTime } from '@fryline/ui/format';
import { readAnnounced, type Announced } from '../model/announced';

function sentence(day: Announced): string {
  const when = `${formatDate(day.date, day.timeZone)} at ${day.place}`;
  if (!day.published) return `Saved ${when} as a draft. Customers do not see it.`;
  const opens = Date.parse(day.ordersOpenAt) <= Date.now() ? 'are open now' : `open ${formatDateTime(day.ordersOpenAt, day.timeZone)}`;
  return `Announced ${when}. Pre-orders ${opens} and close ${formatDateTime(day.cutoffAt, day.timeZone)}.`;
}

/** After the new-bake-day form: what was saved, with a way to its orders. Focus starts here. */
export function AnnouncedNotice() {
  const location = useLocation();
  const navigate = useNavigate();
  const day = readAnnounced(location.state);
  const ref = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!day) return;
    // The layout puts focus on the page heading after a move; take it from there once that is done.
    const frame = requestAnimationFrame(() => ref.current?.focus());
    return () => cancelAnimationFrame(frame);
  }, [day?.id]);

  if (!day) return null;
  return (
    <div ref={ref} tabIndex={-1} role="status" className="notice notice-ok flex flex-wrap items-start justify-between gap-3">
      <p className="min-w-0 flex-1">
        {sentence(day)}
        {day.published && (
          <>
            {' '}
            <Link to={`/bake-days/${day.id}`} className="font-extrabold text-plum-800">
              See its orders
            </Link>
          </>
        )}
      </p>
      <button
        type="button"
        className="btn btn-quiet btn-small bg-white"
        onClick={() => {
          navigate('.', { replace: true, state: null });
          document.getElementById('page-heading')?.focus();
        }}
      >
        Dismiss
      </button>
    </div>
  );
}
