import { useEffect, useRef } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { PageTitle } from '../../../components/page-title';
import { LoadingState, Notice } from '@fryline/ui';
import { isApiError, errorMessage } from '@fryline/ui/api-client';
import { useConfirmSubscription } from '../api/use-announcements';

/** `/news/confirm?token=…`: the link in the confirmation e-mail says yes, once the page has loaded. */
export function ConfirmNewsPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const confirm = useConfirmSubscription();
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current || !token) return;
    sent.current = true;
    confirm.mutate(token);
  }, [token, confirm]);

  return (
    <div className="flex max-w-xl flex-col gap-4">
      <PageTitle>News of bake days</PageTitle>
      <h1 tabIndex={-1} className="text-3xl">
        News of bake days
      </h1>
      {!token || (confirm.isError && isApiError(confirm.error) && confirm.error.status === 404) ? (
        <Notice>
          <p className="font-extrabold">This link doesn't work.</p>
          <p>It may be incomplete, or the address has since asked to stop. You can sign up again from the front page.</p>
        </Notice>
      ) : confirm.isError ? (
        <Notice>
          <p className="font-extrabold">We couldn't confirm just now.</p>
          <p>{errorMessage(confirm.error)}</p>
        </Notice>
      ) : confirm.isSuccess ? (
        <p role="status" className="notice notice-ok">
          Thank you: {confirm.data.email} will get one e-mail each time a new bake day opens for pre-orders. Every e-mail has a link to stop them.
        </p>
      ) : (
        <LoadingState label="Confirming…" />
      )}
      <Link to="/" className="font-semibold text-plum-700 underline">
        See the bake days
      </Link>
    </div>
  );
}
