import { useState } from 'react';
import { ConfirmDialog } from '@fryline/ui';
import { plural } from '@fryline/ui/format';
import { useRestNoShow } from '../api/counter-mutations';
import type { ShownRow } from '../model/pickups';

/** "Mark the rest as no-show": every paid order whose window and grace are over, after one confirmation. */
export function RestNoShowButton({ bakeDayId, rest }: { bakeDayId: string; rest: ShownRow[] }) {
  const [asking, setAsking] = useState(false);
  const { markRest } = useRestNoShow();
  if (rest.length === 0) return null;
  return (
    <>
      <button type="button" className="btn btn-danger min-h-14 w-full" onClick={() => setAsking(true)}>
        Mark the rest as no-show ({rest.length})
      </button>
      <ConfirmDialog
        open={asking}
        title={`Mark ${plural(rest.length, 'order')} as no-show?`}
        confirmLabel={`Yes, mark ${plural(rest.length, 'no-show')}`}
        cancelLabel="Not now"
        onClose={() => setAsking(false)}
        onConfirm={() => {
          markRest({ bakeDayId, count: rest.length });
          setAsking(false);
        }}
      >
        <p>Their pickup windows and the grace time after them are over:</p>
        <ul className="list-disc pl-5">
          {rest.map((r) => (
            <li key={r.orderId}>{r.name}</li>
          ))}
        </ul>
        <p className="text-muted">If one of them turns up later, find the order and tap “Undo no-show”.</p>
      </ConfirmDialog>
    </>
  );
}
