import { useState } from 'react';
import type { OrderView, PickupWindowView } from '@fryline/schemas';
import { useMoveOrder } from '../api/use-order-actions';
import { PickupWindowOptions } from '../../../components/pickup-window-options';
import { useToast } from '../../../components/toast';
import { LoadingState } from '@fryline/ui';
import { errorMessage, isApiError } from '@fryline/ui/api-client';
import { formatClockRange } from '@fryline/ui/format';

interface MoveOrderProps {
  order: OrderView;
  /** The bake day's windows with their room; undefined while loading. */
  windows: PickupWindowView[] | undefined;
}

/** Choose another pickup window with room on the same bake day. */
export function MoveOrder({ order, windows }: MoveOrderProps) {
  const [choice, setChoice] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const move = useMoveOrder();
  const toast = useToast();
  const timeZone = order.bakeDay.timeZone;

  const submit = () => {
    const target = windows?.find((w) => w.id === choice);
    if (!target) {
      setProblem('Choose a pickup window first.');
      return;
    }
    setProblem(null);
    move.mutate(
      { id: order.id, pickupWindowId: target.id },
      {
        onSuccess: () => {
          setChoice(null);
          toast(`Moved to ${formatClockRange(target.startsAt, target.endsAt, timeZone)}.`);
        },
        onError: (error) =>
          setProblem(
            isApiError(error, 'window_full')
              ? 'That window has just filled up. Please choose another.'
              : isApiError(error, 'too_late')
                ? 'It is past the cut-off, so the pickup window can no longer be changed here.'
                : errorMessage(error),
          ),
      },
    );
  };

  return (
    <details className="card">
      <summary className="cursor-pointer text-lg font-extrabold">Change pickup window</summary>
      <div className="mt-3 flex flex-col gap-3">
        {windows === undefined ? (
          <LoadingState label="Looking up the pickup windows…" />
        ) : (
          <PickupWindowOptions
            legend={`Now: ${formatClockRange(order.pickupWindow.startsAt, order.pickupWindow.endsAt, timeZone)}. Move to:`}
            name="move-window"
            windows={windows}
            timeZone={timeZone}
            value={choice}
            onChange={setChoice}
            excludeId={order.pickupWindow.id}
          />
        )}
        {problem && (
          <p role="alert" className="field-error">
            {problem}
          </p>
        )}
        <button type="button" className="btn btn-primary self-start" onClick={submit} disabled={move.isPending}>
          {move.isPending && <span className="spinner" aria-hidden="true" />}
          Move my order
        </button>
      </div>
    </details>
  );
}
