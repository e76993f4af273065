import { Link, useSearchParams } from 'react-router-dom';
import { PageTitle } from '../../../components/page-title';
import { Notice } from '@fryline/ui';
import { errorMessage, isApiError } from '@fryline/ui/api-client';
import { useUnsubscribe } from '../api/use-announcements';

/** `/news/unsubscribe?token=…`: one button, no sign-in. Opening the page alone changes nothing (mail scanners open links). */
export function UnsubscribePage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const leave = useUnsubscribe();
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <PageTitle>Stop the e-mails</PageTitle>
      <h1 tabIndex={-1} className="text-3xl">
        Stop news of bake days
      </h1>
      {leave.isSuccess ? (
        <p role="status" className="notice notice-ok">
          Done: no more e-mails about new bake days. Your orders and their e-mails are not affected.
        </p>
      ) : (
        <>
          <p>You will get no more e-mails about new bake days. You can sign up again any time from the front page.</p>
          <div>
            <button type="button" className="btn btn-primary" disabled={!token || leave.isPending} onClick={() => leave.mutate(token)}>
              {leave.isPending ? 'Stopping…' : 'Stop the e-mails'}
            </button>
          </div>
          {leave.isError && (
            <Notice>
              <p>{isApiError(leave.error) && leave.error.status === 404 ? "This link doesn't work; it may be incomplete." : errorMessage(leave.error)}</p>
            </Notice>
          )}
        </>
      )}
      <Link to="/" className="font-semibold text-plum-700 underline">
        See the bake days
      </Link>
    </div>
  );
}
