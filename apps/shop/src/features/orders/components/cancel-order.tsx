import { useState } from 'react';
import type { OrderView } from '@fryline/schemas';
import { useCancelOrder } from '../api/use-order-actions';
import { ConfirmDialog, useMoney } from '@fryline/ui';
import { useToast } from '../../../components/toast';
import { errorMessage, isApiError } from '@fryline/ui/api-client';
import { formatMoment } from '@fryline/ui/format';

/** "Cancel order" with a confirmation; for a paid order that means a refund. */
export function CancelOrder({ order, onCancelled }: { order: OrderView; onCancelled?: () => void }) {
  const money = useMoney(order.currency);
  const [open, setOpen] = useState(false);
  const cancel = useCancelOrder();
  const toast = useToast();
  const held = order.status === 'held';

  const confirm = () =>
    cancel.mutate(order.id, {
      onSuccess: () => {
        setOpen(false);
        toast(held ? 'Hold cancelled. Nothing was charged.' : 'Order cancelled. Your refund is on its way.');
        onCancelled?.();
      },
      onError: (error) => {
        setOpen(false);
        toast(
          isApiError(error, 'too_late')
            ? 'It is past the cut-off, so this order can no longer be cancelled here.'
            : errorMessage(error),
          'bad',
        );
      },
    });

  return (
    <>
      <button type="button" className="btn btn-quiet" onClick={() => setOpen(true)}>
        {held ? 'Cancel this hold' : 'Cancel order'}
      </button>
      <ConfirmDialog
        open={open}
        title={held ? 'Cancel this hold?' : 'Cancel this order?'}
        confirmLabel={held ? 'Yes, cancel the hold' : 'Yes, cancel and refund'}
        busy={cancel.isPending}
        onConfirm={confirm}
        onClose={() => setOpen(false)}
      >
        {held ? (
          <p>Nothing has been charged. The doughnuts go back on sale for others.</p>
        ) : (
          <>
            <p>
              We refund {money(order.totalCents)} to the card you paid with, and the doughnuts go back on sale.
              This cannot be undone.
            </p>
            <p className="text-sm text-muted">
              Cancelling is possible until {formatMoment(order.bakeDay.cutoffAt, order.bakeDay.timeZone)}.
            </p>
          </>
        )}
      </ConfirmDialog>
    </>
  );
}
