import type { ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { BakeDayView, WaitlistOfferView } from '@fryline/schemas';
import { waitlistQueries } from '../api/waitlist-queries';
import { isApiError } from '@fryline/ui/api-client';
import { formatDate, formatDateTime, formatPieces } from '@fryline/ui/format';
import { currentPath, signInUrl } from '../../../lib/sign-in';
import { ErrorState, LoadingState, Notice } from '@fryline/ui';
import { PageTitle } from '../../../components/page-title';

interface ClaimOfferProps {
  token: string;
  /** What to show once the offer is known to be open. */
  children: (offer: WaitlistOfferView) => ReactNode;
}

function OfferProblem({ children }: { children: ReactNode }) {
  return (
    <section className="flex flex-col gap-4">
      <PageTitle>Waitlist offer</PageTitle>
      <h1 tabIndex={-1} className="text-3xl">
        Waitlist offer
      </h1>
      {children}
    </section>
  );
}

/** A waitlist offer opened from its e-mail link: checks it is still open, then hands it on. */
export function ClaimOffer({ token, children }: ClaimOfferProps) {
  const offer = useQuery({ ...waitlistQueries.claim(token), retry: false });

  if (offer.isPending) return <LoadingState label="Opening your offer…" />;
  if (offer.isSuccess) return children(offer.data);

  const status = isApiError(offer.error) ? offer.error.status : 0;
  if (status === 401) {
    return (
      <OfferProblem>
        <Notice>
          <p className="font-extrabold">Please sign in to open your offer.</p>
          <p>Use the same Google account you joined the waitlist with.</p>
          <a className="btn btn-primary mt-3" href={signInUrl(currentPath())}>
            Sign in
          </a>
        </Notice>
      </OfferProblem>
    );
  }
  if (status === 404 || status === 409 || status === 410) {
    return (
      <OfferProblem>
        <Notice>
          <p className="font-extrabold">This offer is no longer open.</p>
          <p>It has run out or has already been used. When time is up, offers go to the next person in line.</p>
          <Link className="btn btn-primary mt-3" to="/">
            See the bake days
          </Link>
        </Notice>
      </OfferProblem>
    );
  }
  return (
    <OfferProblem>
      <ErrorState error={offer.error} title="We could not open this offer" onRetry={() => void offer.refetch()} />
    </OfferProblem>
  );
}

/** The top of an open offer: which day, how much, and until when. */
export function ClaimOfferSummary({ offer, day }: { offer: WaitlistOfferView; day: BakeDayView }) {
  return (
    <header className="flex flex-col gap-2">
      <PageTitle>Waitlist offer</PageTitle>
      <p className="text-sm font-extrabold tracking-wide text-sugar-700 uppercase">Waitlist offer</p>
      <h1 tabIndex={-1} className="text-3xl">
        Doughnuts freed up for {formatDate(day.date, day.timeZone)}
      </h1>
      <p>
        <span className="font-extrabold">{day.place}</span> · <span className="text-muted">{day.address}</span>
      </p>
      <Notice tone="ok">
        <p>
          You can order up to <strong>{formatPieces(offer.rings, offer.holes)}</strong>. They are set aside for you until{' '}
          <strong>{formatDateTime(offer.expiresAt, day.timeZone)}</strong>; after that they go to the next person.
        </p>
      </Notice>
    </header>
  );
}
