import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { BakeDayEditView } from '@fryline/schemas';
import { errorMessage } from '@fryline/ui/api-client';
import { plural } from '@fryline/ui/format';
import { bakeDayEditQueries, useCallOff } from '../../api/bake-day-edit-queries';

/** How far the refunds and e-mails of a call-off have got, asked for every second until they are all done. */
function CallOffProgress({ jobId }: { jobId: string }) {
  const job = useQuery(bakeDayEditQueries.job(jobId));
  if (!job.data) return <p className="text-muted">Starting…</p>;
  const { done, total, state, lastError } = job.data;
  const percent = total > 0 ? Math.round((done / total) * 100) : 100;
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor="call-off-progress" className="font-extrabold">
        {state === 'done' ? 'All done: every paid order is refunded and everyone has been written to.' : `Refunding and writing to customers: ${done} of ${total} steps`}
      </label>
      <progress id="call-off-progress" className="h-3 w-full accent-plum-700" max={Math.max(total, 1)} value={total > 0 ? done : 1}>
        {percent}%
      </progress>
      {lastError && state !== 'done' && (
        <p className="notice notice-warn">
          The last try stopped at a problem ({lastError}); it is tried again by itself in a moment. Nothing is refunded twice.
        </p>
      )}
    </div>
  );
}

/** Calling the day off (weather, illness): every paid order refunded, every hold released, everyone told once. */
export function CallOffPanel({ day }: { day: BakeDayEditView }) {
  const callOff = useCallOff(day.id);
  const [reason, setReason] = useState('');
  const [sure, setSure] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const jobId = callOff.data?.jobId ?? day.callOff?.id;

  if (jobId) {
    return (
      <section className="card flex flex-col gap-3 border-brick-700" aria-labelledby="call-off-heading">
        <h2 id="call-off-heading" className="text-xl">
          This bake day is called off
        </h2>
        {(day.calledOffReason ?? callOff.variables) && <p>Reason given to customers: {day.calledOffReason ?? callOff.variables}</p>}
        <CallOffProgress jobId={jobId} />
      </section>
    );
  }
  if (day.state === 'done') return null;
  return (
    <form
      className="card flex flex-col gap-3"
      aria-labelledby="call-off-heading"
      onSubmit={(event) => {
        event.preventDefault();
        if (reason.trim().length < 3) return setProblem('Say why, in a few words: customers read it.');
        if (!sure) return setProblem('Tick the box to confirm.');
        setProblem(null);
        callOff.mutate(reason.trim(), { onError: (error) => setProblem(errorMessage(error)) });
      }}
    >
      <h2 id="call-off-heading" className="text-xl">
        Call this bake day off
      </h2>
      <p className="text-muted">
        For bad weather, illness or a broken fryer. Orders stop at once; {plural(day.paidOrders, 'paid order')} will be refunded in full to the card,
        holds are released, and every customer and everyone on the waitlist gets one e-mail. This can't be undone.
      </p>
      <label htmlFor="call-off-reason" className="field-label">
        Why (customers read this)
      </label>
      <textarea id="call-off-reason" className="field-input" rows={2} maxLength={300} value={reason} onChange={(e) => setReason(e.target.value)} />
      <label className="flex items-center gap-2">
        <input type="checkbox" checked={sure} onChange={(e) => setSure(e.target.checked)} />
        Yes, refund everyone and call it off
      </label>
      {problem && (
        <p role="alert" className="notice notice-bad">
          {problem}
        </p>
      )}
      <div>
        <button type="submit" className="btn btn-danger" disabled={callOff.isPending}>
          {callOff.isPending ? 'Calling off…' : 'Call off the bake day'}
        </button>
      </div>
    </form>
  );
}
