import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { bakeDayQueries } from '../../features/bake-days/api/bake-day-queries';
import { availabilityOf } from '../../features/bake-days/components/availability';
import { BakeDayFacts } from '../../features/bake-days/components/bake-day-facts';
import { MenuList } from '../../features/bake-days/components/menu-list';
import { BoxBuilder } from '../../features/box-builder/components/box-builder';
import { ExistingHold } from '../../features/orders/components/existing-hold';
import { WaitlistForm } from '../../features/waitlist/components/waitlist-form';
import { useSignedIn } from '../../features/auth/api/me-queries';
import { isApiError } from '@fryline/ui/api-client';
import { formatDate } from '@fryline/ui/format';
import { ErrorState, LoadingState } from '@fryline/ui';
import { PageTitle } from '../../components/page-title';

export function BakeDayRoute() {
  const { id = '' } = useParams();
  const day = useQuery(bakeDayQueries.detail(id));
  const signedIn = useSignedIn();

  if (day.isPending) return <LoadingState label="Loading the bake day…" />;
  if (day.isError) {
    const missing = isApiError(day.error) && day.error.status === 404;
    return (
      <>
        <PageTitle>Bake day</PageTitle>
        <ErrorState
          error={day.error}
          title={missing ? 'We could not find this bake day' : 'We could not load this bake day'}
          onRetry={missing ? undefined : () => void day.refetch()}
        >
          <Link to="/" className="mt-2 inline-block font-semibold underline">
            See all bake days
          </Link>
        </ErrorState>
      </>
    );
  }

  const info = availabilityOf(day.data);
  const someSoldOut = day.data.remaining.rings <= 0 || (day.data.capacity.holes > 0 && day.data.remaining.holes <= 0);
  return (
    <div className="flex flex-col gap-8">
      <PageTitle>{formatDate(day.data.date, day.data.timeZone)}</PageTitle>
      <BakeDayFacts day={day.data} />
      {info.kind === 'open' && (
        <BoxBuilder
          key={day.data.id}
          day={day.data}
          scope={`day:${day.data.id}`}
          signedIn={signedIn}
          renderHoldExists={(orderId, onResolved) => <ExistingHold orderId={orderId} onResolved={onResolved} />}
        />
      )}
      {(info.kind === 'sold-out' || (info.kind === 'open' && someSoldOut)) && <WaitlistForm day={day.data} />}
      {info.kind !== 'open' && <MenuList day={day.data} />}
    </div>
  );
}
