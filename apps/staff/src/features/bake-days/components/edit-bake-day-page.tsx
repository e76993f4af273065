import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState } from '@fryline/ui';
import { isApiError } from '@fryline/ui/api-client';
import { formatDate, plural } from '@fryline/ui/format';
import { bakeDayEditQueries } from '../api/bake-day-edit-queries';
import { BakeDayStatusBadge } from './status-badge';
import { SellingActions } from './edit/selling-actions';
import { PlaceForm } from './edit/place-form';
import { WindowsForm } from './edit/windows-form';
import { TimesForm } from './edit/times-form';
import { CapacityForm } from './edit/capacity-form';
import { MenuForm } from './edit/menu-form';
import { CallOffPanel } from './edit/call-off-panel';

/** `/staff/bake-days/:id/edit`: the owner changes an announced bake day, or calls it off. */
export function EditBakeDayPage({ bakeDayId }: { bakeDayId: string }) {
  const day = useQuery(bakeDayEditQueries.detail(bakeDayId));
  if (day.isPending) {
    return (
      <PageFrame title="Change a bake day">
        <LoadingState label="Loading the bake day…" />
      </PageFrame>
    );
  }
  if (day.isError) {
    const missing = isApiError(day.error) && (day.error.status === 404 || day.error.status === 400);
    return (
      <PageFrame title={missing ? 'No such bake day' : 'Change a bake day'}>
        <ErrorState error={day.error} title="This bake day could not be loaded" onRetry={() => void day.refetch()} />
      </PageFrame>
    );
  }
  const d = day.data;
  const locked = d.state === 'cancelled' || d.state === 'done';
  return (
    <PageFrame
      eyebrow="Owner · Bake days"
      title={`Change ${formatDate(d.date, d.timeZone)}`}
      intro={
        <>
          {d.place} · {plural(d.paidOrders, 'paid order')}.{' '}
          <Link to={`/bake-days/${d.id}`} className="font-extrabold text-plum-800 underline">
            See its orders
          </Link>
        </>
      }
    >
      <div className="flex flex-wrap items-center gap-2">
        {d.state === 'cancelled' ? <span className="badge badge-bad">Called off</span> : <BakeDayStatusBadge status={d.status} />}
        {d.state === 'draft' && <span className="badge">Draft: customers don't see it yet</span>}
      </div>
      {locked && (
        <p className="notice">
          {d.state === 'cancelled' ? 'This bake day is called off: nothing about it can change any more.' : 'This bake day is marked done: nothing about it can change any more.'}
        </p>
      )}
      {!locked && (
        <>
          <SellingActions day={d} />
          <PlaceForm day={d} />
          <WindowsForm day={d} />
          <TimesForm day={d} />
          <CapacityForm day={d} />
          <MenuForm day={d} />
        </>
      )}
      <CallOffPanel day={d} />
    </PageFrame>
  );
}
