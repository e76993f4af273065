import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { ClaimOffer, ClaimOfferSummary } from '../../features/waitlist/components/claim-offer';
import type { WaitlistOfferView } from '@fryline/schemas';
import { bakeDayQueries } from '../../features/bake-days/api/bake-day-queries';
import { BoxBuilder } from '../../features/box-builder/components/box-builder';
import { ExistingHold } from '../../features/orders/components/existing-hold';
import { useSignedIn } from '../../features/auth/api/me-queries';
import { ErrorState, LoadingState } from '@fryline/ui';

/** The offer's bake day, and a box builder limited to what was offered. */
function ClaimWithDay({ offer, token }: { offer: WaitlistOfferView; token: string }) {
  const day = useQuery(bakeDayQueries.detail(offer.bakeDayId));
  const signedIn = useSignedIn();

  if (day.isPending) return <LoadingState label="Loading the bake day…" />;
  if (day.isError) {
    return <ErrorState error={day.error} title="We could not load this bake day" onRetry={() => void day.refetch()} />;
  }
  return (
    <div className="flex flex-col gap-8">
      <ClaimOfferSummary offer={offer} day={day.data} />
      <BoxBuilder
        day={day.data}
        scope={`claim:${token}`}
        limits={{ rings: offer.rings, holes: offer.holes }}
        claimToken={token}
        signedIn={signedIn}
        renderHoldExists={(orderId, onResolved) => <ExistingHold orderId={orderId} onResolved={onResolved} />}
      />
    </div>
  );
}

export function ClaimRoute() {
  const { token = '' } = useParams();
  return <ClaimOffer token={token}>{(offer) => <ClaimWithDay offer={offer} token={token} />}</ClaimOffer>;
}
