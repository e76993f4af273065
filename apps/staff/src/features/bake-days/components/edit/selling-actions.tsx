import { useState } from 'react';
import type { BakeDayEditResult, BakeDayEditView } from '@fryline/schemas';
import { errorMessage } from '@fryline/ui/api-client';
import { formatMoment } from '@fryline/ui/format';
import { useBakeDayAction, type BakeDayAction } from '../../api/bake-day-edit-queries';
import { SaveResult } from './section-form';

/** Open orders early, close them early, or mark the day done. */
export function SellingActions({ day }: { day: BakeDayEditView }) {
  const action = useBakeDayAction(day.id);
  const [result, setResult] = useState<BakeDayEditResult | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const run = (what: BakeDayAction) => {
    setResult(null);
    setProblem(null);
    action.mutate(what, { onSuccess: setResult, onError: (error) => setProblem(errorMessage(error)) });
  };
  const busy = action.isPending;
  return (
    <section className="card flex flex-col gap-3" aria-labelledby="selling-heading">
      <h2 id="selling-heading" className="text-xl">
        Taking orders
      </h2>
      <p>
        Orders open {formatMoment(day.ordersOpenAt, day.timeZone)} and close {formatMoment(day.cutoffAt, day.timeZone)}.
      </p>
      <div className="flex flex-wrap gap-2">
        {day.status === 'upcoming' && day.state === 'published' && (
          <button type="button" className="btn btn-primary" disabled={busy} onClick={() => run('open-now')}>
            Open orders now
          </button>
        )}
        {(day.status === 'open' || day.status === 'upcoming') && (
          <button type="button" className="btn btn-quiet" disabled={busy} onClick={() => run('close-now')}>
            Close orders now
          </button>
        )}
        {day.state === 'published' && (
          <button type="button" className="btn btn-quiet" disabled={busy} onClick={() => run('mark-done')}>
            Mark the day done
          </button>
        )}
      </div>
      {problem && (
        <p role="alert" className="notice notice-bad">
          {problem}
        </p>
      )}
      {result && <SaveResult result={result} />}
    </section>
  );
}
